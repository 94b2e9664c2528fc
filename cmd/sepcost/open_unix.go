//go:build unix

package main

import (
	"os"
	"syscall"
)

// openNoBlock opens a file for reading without waiting on a pipe that has
// no writer (the caller refuses anything but a regular file).
func openNoBlock(path string) (*os.File, error) {
	return os.OpenFile(path, os.O_RDONLY|syscall.O_NONBLOCK, 0)
}
