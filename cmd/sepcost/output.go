package main

import (
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
// and a rename, so a failed write never leaves half a file. Without force,
// an existing file is refused and left untouched.
func writeFile(path string, data []byte, force bool) error {
	if !force {
		if _, err := os.Stat(path); err == nil {
			return fmt.Errorf("%s: %w; choose another name with -o or add --force to replace it", path, ErrExists)
		} else if !errors.Is(err, fs.ErrNotExist) {
			return err
		}
	}
	dir := filepath.Dir(path)
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".*.tmp")
	if err != nil {
		return fmt.Errorf("cannot write in %s: %w", dir, err)
	}
	name := tmp.Name()
	// CreateTemp makes the file private (0600); an output is an ordinary
	// document, readable by others (0644).
	_ = tmp.Chmod(0o644)
	_, werr := tmp.Write(data)
	cerr := tmp.Close()
	if werr != nil || cerr != nil {
		os.Remove(name)
		return fmt.Errorf("writing %s: %w", path, errors.Join(werr, cerr))
	}
	if force {
		err = os.Rename(name, path)
	} else {
		// Link fails if the target appeared meanwhile: never clobber.
		err = os.Link(name, path)
		os.Remove(name)
	}
	if err != nil {
		os.Remove(name)
		if errors.Is(err, fs.ErrExist) {
			return fmt.Errorf("%s: %w; add --force to replace it", path, ErrExists)
		}
		return fmt.Errorf("writing %s: %w", path, err)
	}
	return nil
}

// extFormats maps an output file's extension to the format it holds.
var extFormats = map[string]string{".xlsx": "xlsx", ".json": "json", ".csv": "csv", ".txt": "text"}

// formatExt is the extension a file of the format takes.
var formatExt = map[string]string{"xlsx": ".xlsx", "json": ".json", "csv": ".csv", "text": ".txt"}

// formatFor decides the output format: the --format flag, else from the
// -o file's extension, else text to the terminal. A --format that
// contradicts the extension of -o (--format json -o plan.xlsx) is a usage
// error: a file must hold what its name says.
func formatFor(flag, out string) (string, error) {
	f := strings.ToLower(flag)
	ext := strings.ToLower(filepath.Ext(out))
	byExt, known := extFormats[ext]
	if f == "" {
		switch {
		case known:
			f = byExt
		case out == "" || out == "-":
			f = "text"
		default:
			return "", usageError{fmt.Errorf("-o %s: cannot tell the format from the extension; name the file .xlsx, .json, .csv or .txt, or add --format xlsx, json, csv or text", out)}
		}
	}
	if _, ok := formatExt[f]; !ok {
		return "", usageError{fmt.Errorf("--format %q: write xlsx, json, csv or text", flag)}
	}
	if known && byExt != f {
		return "", usageError{fmt.Errorf("--format %s but -o %s has the extension of %s: make them agree (for example -o %s)",
			f, out, byExt, strings.TrimSuffix(out, filepath.Ext(out))+formatExt[f])}
	}
	if f == "xlsx" && (out == "" || out == "-") {
		return "", usageError{errors.New("--format xlsx needs an output file: add -o plan.xlsx")}
	}
	return f, nil
}

// defaultOut is the default output file for a command whose default is
// base (e.g. "sepcost-demo") with the extension of the format; text goes to
// the terminal ("").
func defaultOut(base, format string) string {
	if format == "text" {
		return ""
	}
	return base + formatExt[format]
}

// emit writes rendered output to the file or to stdout.
func emit(buf *bytes.Buffer, out string, force bool, stdout io.Writer) error {
	if out == "" || out == "-" {
		_, err := stdout.Write(buf.Bytes())
		return err
	}
	return writeFile(out, buf.Bytes(), force)
}
