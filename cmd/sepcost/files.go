package main

import (
	"crypto/rand"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"sync"
)

// readInput reads a user's input file through one bounded path: only a
// regular file is opened (a folder, device, pipe or socket is refused
// before it is opened, so a pipe cannot hang the run and /dev/zero cannot
// fill memory), and no more than limit bytes are read, whatever the file
// claims its size is. Every message names the file and what is valid.
func readInput(path, what string, limit int64) ([]byte, error) {
	fi, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, fmt.Errorf("%s: no such %s file", path, what)
	}
	if err != nil {
		return nil, fmt.Errorf("%s: cannot read the %s file: %w", path, what, err)
	}
	if err := checkInput(path, what, fi, limit); err != nil {
		return nil, err
	}
	f, err := openNoBlock(path)
	if err != nil {
		return nil, fmt.Errorf("%s: cannot read the %s file: %w", path, what, err)
	}
	defer f.Close()
	// The file may have been swapped since Stat: look again at what is open.
	if fi, err = f.Stat(); err != nil {
		return nil, fmt.Errorf("%s: cannot read the %s file: %w", path, what, err)
	}
	if err := checkInput(path, what, fi, limit); err != nil {
		return nil, err
	}
	data, err := io.ReadAll(io.LimitReader(f, limit+1))
	if err != nil {
		return nil, fmt.Errorf("%s: cannot read the %s file: %w", path, what, err)
	}
	if int64(len(data)) > limit {
		return nil, tooLarge(path, what, limit)
	}
	return data, nil
}

// checkInput refuses anything but a regular file within the size limit.
func checkInput(path, what string, fi fs.FileInfo, limit int64) error {
	switch {
	case fi.IsDir():
		return fmt.Errorf("%s: is a folder; give the %s file itself", path, what)
	case !fi.Mode().IsRegular():
		return fmt.Errorf("%s: not a regular file (a device, pipe or socket); sepcost reads a %s only from a regular file", path, what)
	case fi.Size() > limit:
		return tooLarge(path, what, limit)
	}
	return nil
}

func tooLarge(path, what string, limit int64) error {
	return fmt.Errorf("%s: larger than %s; a %s file may have at most %d bytes", path, sizeWords(limit), what, limit)
}

// sizeWords is a byte count in MiB or KiB.
func sizeWords(n int64) string {
	if n >= 1<<20 {
		return fmt.Sprintf("%g MiB", float64(n)/(1<<20))
	}
	return fmt.Sprintf("%g KiB", float64(n)/(1<<10))
}

// temps are the temporary output files being written, removed on an
// interrupt. The lock is held while a temporary file is put in place, so
// that an interrupt either finds it still temporary or already placed.
var temps = struct {
	sync.Mutex
	names map[string]bool
}{names: map[string]bool{}}

// removeTemps removes every temporary output file still being written.
func removeTemps() {
	temps.Lock()
	defer temps.Unlock()
	for name := range temps.names {
		os.Remove(name)
		delete(temps.names, name)
	}
}

// afterTempWrite, when set (by tests), runs after the data is written to
// the temporary file and before it is put in place.
var afterTempWrite func(tmp string)

// createTemp makes a new temporary file beside path. It is opened with mode
// 0666, so that the user's umask decides its permissions, as for any file
// a program creates.
func createTemp(path string) (*os.File, error) {
	dir, base := filepath.Dir(path), filepath.Base(path)
	for range 100 {
		var b [6]byte
		if _, err := rand.Read(b[:]); err != nil {
			return nil, err
		}
		name := filepath.Join(dir, "."+base+"."+hex.EncodeToString(b[:])+".tmp")
		temps.Lock()
		f, err := os.OpenFile(name, os.O_RDWR|os.O_CREATE|os.O_EXCL, 0o666)
		if err == nil {
			temps.names[name] = true
		}
		temps.Unlock()
		if !errors.Is(err, fs.ErrExist) {
			return f, err
		}
	}
	return nil, fmt.Errorf("cannot find a free temporary name in %s", dir)
}

// dropTemp forgets and removes a temporary file.
func dropTemp(name string) {
	temps.Lock()
	defer temps.Unlock()
	os.Remove(name)
	delete(temps.names, name)
}
