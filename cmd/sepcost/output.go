package main

import (
	"bufio"
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
)

// ErrExists is returned when an output file exists and --force was not given.
var ErrExists = errors.New("output file exists")

// writeFile writes data to path through a temporary file in the same folder
// and a rename, so a failed or interrupted write never leaves half a file.
// Only a regular file is ever replaced, and only with force: a folder, a
// device, a pipe, a socket or a symbolic link is refused whatever the
// flags. A new file's mode follows the umask; a replaced file keeps its
// mode.
func writeFile(path string, data []byte, force bool) error {
	return writeFileFrom(path, force, func(w io.Writer) error {
		_, err := w.Write(data)
		return err
	})
}

// writeFileFrom is writeFile with the content written by write straight
// into the temporary file, so that a large report is never held whole in
// memory. The file is placed only when write succeeds.
func writeFileFrom(path string, force bool, write func(io.Writer) error) error {
	keep, err := checkTarget(path, force)
	if err != nil {
		return err
	}
	tmp, err := createTemp(path)
	if err != nil {
		return fmt.Errorf("cannot write in %s: %w", filepath.Dir(path), err)
	}
	name := tmp.Name()
	var cerr error
	if keep != nil {
		cerr = tmp.Chmod(*keep)
	}
	bw := bufio.NewWriterSize(tmp, 256<<10)
	werr := write(bw)
	if werr == nil {
		werr = bw.Flush()
	}
	if werr == nil {
		werr = tmp.Sync()
	}
	cerr = errors.Join(cerr, tmp.Close())
	if werr != nil || cerr != nil {
		dropTemp(name)
		return fmt.Errorf("writing %s: %w", path, errors.Join(werr, cerr))
	}
	if afterTempWrite != nil {
		afterTempWrite(name)
	}
	return placeTemp(name, path, force)
}

// checkTarget looks at the output path before anything is written: it
// returns the mode to keep when a regular file is replaced.
func checkTarget(path string, force bool) (*fs.FileMode, error) {
	fi, err := os.Lstat(path)
	switch {
	case errors.Is(err, fs.ErrNotExist):
		return nil, nil
	case err != nil:
		return nil, fmt.Errorf("%s: cannot look at the output file: %w", path, err)
	case fi.IsDir():
		return nil, usageError{fmt.Errorf("%s is a folder; give a file name with -o, e.g. -o %s", path, filepath.Join(path, "plan.xlsx"))}
	case !fi.Mode().IsRegular():
		return nil, fmt.Errorf("%s is not a regular file (a device, pipe, socket or symbolic link); sepcost writes only regular files and never replaces anything else, even with --force: choose another name with -o", path)
	case !force:
		return nil, fmt.Errorf("%s: %w; choose another name with -o or add --force to replace it", path, ErrExists)
	}
	m := fi.Mode().Perm()
	return &m, nil
}

// placeTemp puts the finished temporary file at path: with force by a
// rename over the regular file found there, else by a link that fails if
// the target appeared meanwhile (never clobber).
func placeTemp(name, path string, force bool) error {
	temps.Lock()
	defer temps.Unlock()
	var err error
	if force {
		err = os.Rename(name, path)
	} else {
		err = os.Link(name, path)
	}
	os.Remove(name)
	delete(temps.names, name)
	if errors.Is(err, fs.ErrExist) {
		return fmt.Errorf("%s: %w; choose another name with -o or add --force to replace it", path, ErrExists)
	}
	if err != nil {
		return fmt.Errorf("writing %s: %w", path, err)
	}
	return nil
}

// formatFor decides the output format: the --format flag, else from the
// -o file's extension, else text to the terminal. A --format that
// contradicts the extension of -o (--format json -o plan.xlsx) is a usage
// error: a file must hold what its name says.
func formatFor(flag, out string) (format, error) {
	f := format(strings.ToLower(flag))
	ext := strings.ToLower(filepath.Ext(out))
	byExt, known := formatOfExt(ext)
	if f == "" {
		switch {
		case known:
			f = byExt
		case out == "" || out == "-":
			f = formatText
		default:
			return "", usageError{fmt.Errorf("-o %s: cannot tell the format from the extension; name the file .xlsx, .json, .csv or .txt, or add --format xlsx, json, csv or text", out)}
		}
	}
	if f.ext() == "" {
		return "", usageError{fmt.Errorf("--format %q: write xlsx, json, csv or text", flag)}
	}
	if known && byExt != f {
		return "", usageError{fmt.Errorf("--format %s but -o %s has the extension of %s: make them agree (for example -o %s)",
			f, out, byExt, strings.TrimSuffix(out, filepath.Ext(out))+f.ext())}
	}
	if f == formatXLSX && (out == "" || out == "-") {
		return "", usageError{errors.New("--format xlsx needs an output file: add -o plan.xlsx")}
	}
	return f, nil
}

// defaultOut is the default output file for a command whose default is
// base (e.g. "sepcost-demo") with the extension of the format; text goes to
// the terminal ("").
func defaultOut(base string, f format) string {
	if f == formatText {
		return ""
	}
	return base + f.ext()
}

// emit writes rendered output to the file or to stdout.
func emit(buf *bytes.Buffer, out string, force bool, stdout io.Writer) error {
	if out == "" || out == "-" {
		_, err := stdout.Write(buf.Bytes())
		return err
	}
	return writeFile(out, buf.Bytes(), force)
}
