//go:build !linux

package main

import "errors"

var errNoRSS = errors.New("peak resident set: measured on Linux only (/proc/self/status)")

// peakRSS is not measured on this platform.
func peakRSS([]string) (float64, error) { return 0, errNoRSS }

// ownPeakRSS is not measured on this platform.
func ownPeakRSS() (string, error) { return "", errNoRSS }
