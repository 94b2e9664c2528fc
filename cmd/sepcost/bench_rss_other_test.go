//go:build !unix

package main

import "errors"

// peakRSS is not measured on this platform.
func peakRSS([]string) (float64, error) {
	return 0, errors.New("peak resident set: measured on unix only")
}
