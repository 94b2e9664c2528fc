//go:build unix

package main

import (
	"bytes"
	"context"
	"errors"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"

	"sepcost/templates"
)

// writeCase writes the short scenario and the example prices into dir.
func writeCase(t *testing.T, dir string) string {
	t.Helper()
	sc := filepath.Join(dir, "s.yaml")
	if err := os.WriteFile(sc, []byte(caseScenario), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "prices.csv"), templates.Prices, 0o644); err != nil {
		t.Fatal(err)
	}
	return sc
}

// A new output's mode follows the umask, as for any file a program
// creates (POSIX open(2): mode & ~umask); --force keeps the mode of the
// file it replaces.
func TestOutputModes(t *testing.T) {
	dir := t.TempDir()
	sc := writeCase(t, dir)
	old := syscall.Umask(0o027)
	defer syscall.Umask(old)
	out := filepath.Join(dir, "a.json")
	if _, _, err := runCLI(t, "estimate", sc, "--draws", "0", "-o", out); err != nil {
		t.Fatal(err)
	}
	if fi, err := os.Stat(out); err != nil || fi.Mode().Perm() != 0o640 {
		t.Errorf("new file mode %v (%v), want 0640 under umask 027", fi.Mode().Perm(), err)
	}
	private := filepath.Join(dir, "private.json")
	if err := os.WriteFile(private, []byte("old"), 0o600); err != nil {
		t.Fatal(err)
	}
	os.Chmod(private, 0o600)
	if _, _, err := runCLI(t, "estimate", sc, "--draws", "0", "-o", private, "--force"); err != nil {
		t.Fatal(err)
	}
	fi, err := os.Stat(private)
	if err != nil || fi.Mode().Perm() != 0o600 {
		t.Errorf("replaced file mode %v (%v), want 0600 kept", fi.Mode().Perm(), err)
	}
	if data, _ := os.ReadFile(private); !bytes.Contains(data, []byte(`"batches"`)) {
		t.Errorf("replaced file does not hold the report: %.80s", data)
	}
	assertNoTemp(t, dir)
}

// assertNoTemp fails when a temporary output file is left in dir.
func assertNoTemp(t *testing.T, dir string) {
	t.Helper()
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".tmp") {
			t.Errorf("temporary file left behind: %s", e.Name())
		}
	}
}

// SIGTERM while an output is being written removes the temporary file, and
// the exit code is the shell's 128 + 15.
func TestInterruptRemovesTemp(t *testing.T) {
	if dir := os.Getenv("SEPCOST_INTERRUPT_DIR"); dir != "" {
		// The child: stop after the temporary file is written and wait to
		// be terminated.
		afterTempWrite = func(string) {
			os.WriteFile(filepath.Join(dir, "ready"), nil, 0o644)
			time.Sleep(30 * time.Second)
		}
		os.Exit(mainWith([]string{"estimate", filepath.Join(dir, "s.yaml"), "--draws", "0", "-o", filepath.Join(dir, "out.json")}))
	}
	dir := t.TempDir()
	writeCase(t, dir)
	cmd := exec.Command(os.Args[0], "-test.run=^TestInterruptRemovesTemp$")
	cmd.Env = append(os.Environ(), "SEPCOST_INTERRUPT_DIR="+dir)
	var stderr bytes.Buffer
	cmd.Stderr = &stderr
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	deadline := time.Now().Add(20 * time.Second)
	for {
		if _, err := os.Stat(filepath.Join(dir, "ready")); err == nil {
			break
		}
		if time.Now().After(deadline) {
			cmd.Process.Kill()
			t.Fatalf("the child never reached the write: %s", stderr.String())
		}
		time.Sleep(20 * time.Millisecond)
	}
	cmd.Process.Signal(syscall.SIGTERM)
	err := cmd.Wait()
	var ee *exec.ExitError
	if !errors.As(err, &ee) || ee.ExitCode() != 143 {
		t.Errorf("exit %v, want 143; stderr %s", err, stderr.String())
	}
	if !strings.Contains(stderr.String(), "unfinished output file was removed") {
		t.Errorf("stderr %q", stderr.String())
	}
	assertNoTemp(t, dir)
	if _, err := os.Stat(filepath.Join(dir, "out.json")); err == nil {
		t.Error("an output was written although the run was stopped")
	}
}

// failWriter fails every write, as a full disk or a closed pipe does.
type failWriter struct{}

func (failWriter) Write([]byte) (int, error) { return 0, syscall.ENOSPC }

// A report lost on the way to stdout is a failure (exit 1), not a success;
// /dev/full is tried too where it exists.
func TestStdoutWriteError(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	sc := writeCase(t, dir)
	for _, args := range [][]string{
		{"check", sc},
		{"estimate", sc, "--draws", "0"},
		{"solvents"},
	} {
		err := run(context.Background(), args, failWriter{}, &bytes.Buffer{})
		if exitCode(err) != 1 || err == nil || !strings.Contains(err.Error(), "writing to standard output") {
			t.Errorf("%v: exit %d, %v", args, exitCode(err), err)
		}
	}
	full, err := os.OpenFile("/dev/full", os.O_WRONLY, 0)
	if err != nil {
		t.Skip("no /dev/full here")
	}
	defer full.Close()
	if err := run(context.Background(), []string{"check", sc}, full, &bytes.Buffer{}); exitCode(err) != 1 {
		t.Errorf("check > /dev/full: exit %d (%v)", exitCode(err), err)
	}
}

// Text from a user's file never reaches the terminal as a control
// sequence: ESC [ 2 J (ECMA-48, erase in display) in a scenario name is
// shown as the escape \x1b.
func TestTerminalEscapes(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	sc := writeCase(t, dir)
	named := strings.Replace(caseScenario, "name: bad-input case", `name: "\e[2J\e]0;owned\a case\u202e"`, 1)
	os.WriteFile(sc, []byte(named), 0o644)
	for _, args := range [][]string{{"estimate", sc, "--draws", "0"}, {"check", sc}, {"estimate", sc, "--draws", "0", "--format", "csv"}} {
		out, _, err := runCLI(t, args...)
		if err != nil {
			t.Fatalf("%v: %v", args, err)
		}
		if strings.ContainsAny(out, "\x1b\a\u202e") {
			t.Errorf("%v: raw control characters reach the terminal: %q", args, out)
		}
	}
	out, _, _ := runCLI(t, "estimate", sc, "--draws", "0")
	if !strings.Contains(out, `\x1b[2J`) {
		t.Errorf("the escape is not shown as text: %.300q", out)
	}
	if got := string(sanitize([]byte("a\tb\nc\r\x7f\u0085é"))); got != `a`+"\t"+`b`+"\n"+`c\x0d\x7f\u0085é` {
		t.Errorf("sanitize = %q", got)
	}
}

// check passes only what every writer accepts: a price item whose letter
// case differs from the name the models ask for ("Silica gel", "ANISOLE")
// is found by the price lookup and accepted by the workbook writer too.
func TestPriceNamesAnyCase(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	sc := writeCase(t, dir)
	pr := strings.Replace(string(templates.Prices), "\nsilica gel,", "\nSilica gel,", 1)
	pr = strings.Replace(pr, "\nethyl acetate,", "\nETHYL ACETATE,", 1)
	if pr == string(templates.Prices) || !strings.Contains(pr, "ETHYL ACETATE,") {
		t.Fatal("the example prices lack silica gel or ethyl acetate")
	}
	os.WriteFile(filepath.Join(dir, "prices.csv"), []byte(pr), 0o644)
	if _, _, err := runCLI(t, "check", sc); err != nil {
		t.Fatalf("check: %v", err)
	}
	for _, out := range []string{"p.xlsx", "p.json", "p.csv"} {
		if _, _, err := runCLI(t, "estimate", sc, "--draws", "0", "-o", filepath.Join(dir, out)); err != nil {
			t.Errorf("%s: %v", out, err)
		}
	}
}
