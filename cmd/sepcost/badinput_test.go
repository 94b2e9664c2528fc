//go:build unix

package main

import (
	"bytes"
	"context"
	"crypto/sha256"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"

	"sepcost/templates"
)

// caseScenario is a short scenario whose lines the cases below refer to.
const caseScenario = `name: bad-input case
masses: ["20 g"]
crude: {purity: 0.8}
chromatography:
  tlc_eluent: {n-heptane: 0.75, ethyl acetate: 0.25}
  product_rf: 0.30
  impurity_rf: 0.42
`

// badCase is one careless or hostile input: the files it needs (written
// into a fresh folder as {dir}), the command line, the exit code wanted,
// the words the message must hold (file, line, field, what is valid) and
// words it must not hold (Go type names, echoed file contents).
type badCase struct {
	name    string
	files   map[string]string
	setup   func(t *testing.T, dir string)
	args    []string
	code    int
	want    []string
	notWant []string
}

// The bad-input campaign: every case is refused with a clear message, and
// the folder is left exactly as it was (no file written, changed or
// removed, no temporary file left).
func TestBadInput(t *testing.T) {
	t.Parallel()
	sc := map[string]string{"s.yaml": caseScenario, "prices.csv": string(templates.Prices)}
	with := func(extra map[string]string) map[string]string {
		out := map[string]string{}
		for k, v := range sc {
			out[k] = v
		}
		for k, v := range extra {
			out[k] = v
		}
		return out
	}
	setting := func(line string) map[string]string {
		return with(map[string]string{"s.yaml": caseScenario + "settings:\n  " + line + "\n"})
	}
	cases := []badCase{
		// 1. A quoting error in a plan panicked.
		{name: "plan quoting error", files: with(map[string]string{"plan.csv": "scenario,mass,runs\n\"s.yaml,20 g,3\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"plan.csv:2", "not valid CSV", "double quotes"}},
		// 2. --force replaced special files.
		{name: "force onto a pipe", files: sc, setup: mkfifo("out.json"),
			args: []string{"estimate", "{dir}/s.yaml", "--draws", "0", "-o", "{dir}/out.json", "--force"}, code: 1,
			want: []string{"out.json", "not a regular file", "even with --force"}},
		{name: "force onto a symbolic link", files: with(map[string]string{"target.json": "keep"}), setup: symlink("target.json", "out.json"),
			args: []string{"estimate", "{dir}/s.yaml", "--draws", "0", "-o", "{dir}/out.json", "--force"}, code: 1,
			want: []string{"out.json", "not a regular file"}},
		// 4. Unbounded reads: a pipe hung, a large file was read whole, price tables had no limit.
		{name: "scenario is a pipe", files: sc, setup: mkfifo("pipe.yaml"),
			args: []string{"check", "{dir}/pipe.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"pipe.yaml", "not a regular file", "scenario"}},
		{name: "price table is a pipe", files: sc, setup: mkfifo("pipe.csv"),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/pipe.csv"}, code: 1,
			want: []string{"pipe.csv", "not a regular file", "price table"}},
		{name: "scenario is a folder", files: sc, setup: mkdir("sub.yaml"),
			args: []string{"check", "{dir}/sub.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"sub.yaml", "is a folder"}},
		{name: "huge sparse scenario", files: sc, setup: sparse("big.yaml", 64<<20),
			args: []string{"check", "{dir}/big.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"big.yaml", "larger than 1 MiB", "1048576 bytes"}},
		{name: "huge sparse price table", files: sc, setup: sparse("big.csv", 5<<20),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/big.csv"}, code: 1,
			want: []string{"big.csv", "larger than 4 MiB", "price table"}},
		{name: "huge sparse plan", files: sc, setup: sparse("plan.csv", 2<<20),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1,
			want: []string{"plan.csv", "larger than 1 MiB", "plan"}},
		// 5. A price table longer than a sheet panicked the workbook writer.
		{name: "price table with too many items", files: with(map[string]string{"prices.csv": string(templates.Prices) + manyItems(10001)}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"prices.csv:", "more than 10000 items"}},
		{name: "long price field is cut short", files: with(map[string]string{"prices.csv": string(templates.Prices) + strings.Repeat("y", 3000) + ",kg,1,EUR,,,,\n" + strings.Repeat("y", 3000) + ",kg,1,EUR,,,,\n"}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"prices.csv:", "listed twice", `yyy…"`}, notWant: []string{strings.Repeat("y", 41)}},
		// 6. Settings without ranges.
		{name: "share above 100 %", files: setting(`chromatography.silica_retention_loss: "150 %"`),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:9:", "settings.chromatography.silica_retention_loss", "outside the range", "0 to 0.5"}},
		{name: "zero heater efficiency", files: setting(`chromatography.evaporator_heat_efficiency: "0 %"`),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:9:", "settings.chromatography.evaporator_heat_efficiency", "0.01 to 1"}},
		{name: "negative time", files: setting(`distillation.cooldown_time: "-30 min"`),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:9:", "settings.distillation.cooldown_time", "0 to 2880 min"}},
		// 7. Masses without bounds.
		{name: "mass far too large", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--mass", "1e30kg"}, code: 2,
			want: []string{"--mass", "1e30kg", "from 1 mg to 10 t"}},
		{name: "mass far too small", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--mass", "1e-30g"}, code: 2,
			want: []string{"--mass", "from 1 mg to 10 t"}},
		{name: "mass overflows", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--mass", "1e306 t"}, code: 2,
			want: []string{"--mass", "too large"}},
		{name: "unit exponents wrap", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--mass", "1 " + strings.Repeat("kg^4 ", 64) + "kg"}, code: 2,
			want: []string{"--mass", "at most 100"}},
		{name: "unit powers add up", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--mass", "1 kg^4 kg^4 kg^4"}, code: 2,
			want: []string{"--mass", "powers from -8 to 8"}},
		{name: "target too large", files: sc, args: []string{"estimate", "{dir}/s.yaml", "--target", "1e30 kg"}, code: 2,
			want: []string{"--target", "from 1 mg to 10 t"}},
		{name: "sweep from too large", files: sc, args: []string{"sweep", "{dir}/s.yaml", "--from", "1e30 kg", "--to", "1e31 kg"}, code: 2,
			want: []string{"--from", "from 1 mg to 10 t"}},
		{name: "scenario mass too large", files: with(map[string]string{"s.yaml": strings.Replace(caseScenario, `["20 g"]`, `["20 g", "7e17 kg"]`, 1)}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:2:", "masses[1]", "from 1 mg to 10 t"}},
		{name: "plan mass too large", files: with(map[string]string{"plan.csv": "scenario,mass,runs\ns.yaml,1e30 kg,1\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"plan.csv:2", "mass", "from 1 mg to 10 t"}},
		// 9. Messages.
		{name: "YAML syntax error line", files: with(map[string]string{"s.yaml": strings.Replace(caseScenario, `crude: {purity: 0.8}`, `crude: {purity: 0.8`, 1)}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:3:", "not valid YAML"}},
		{name: "unknown key with no value", files: with(map[string]string{"s.yaml": caseScenario + "colour:\n"}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:8:", "colour", "not a known field", "masses"}},
		{name: "wrong type", files: with(map[string]string{"s.yaml": strings.Replace(caseScenario, `masses: ["20 g"]`, `masses: {a: 1}`, 1)}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:2:", "a section of keys and values", "a list"}, notWant: []string{"rawScenario", "scenario.", "[]scenario", "unmarshal"}},
		{name: "output is a folder", files: sc, setup: mkdir("outdir"),
			args: []string{"estimate", "{dir}/s.yaml", "--draws", "0", "-o", "{dir}/outdir", "--format", "json", "--force"}, code: 2,
			want: []string{"outdir is a folder", "give a file name with -o"}, notWant: []string{"add --force"}},
		{name: "missing argument", files: sc, args: []string{"estimate"}, code: 2,
			want: []string{"estimate needs the scenario file", "sepcost estimate mycase/scenario.yaml"}, notWant: []string{"accepts 1 arg"}},
		{name: "missing plan argument", files: sc, args: []string{"portfolio"}, code: 2,
			want: []string{"portfolio needs the plan file"}},
		// 10. Silently accepted or leaked.
		{name: "second YAML document", files: with(map[string]string{"s.yaml": caseScenario + "---\nname: another\n"}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1,
			want: []string{"s.yaml:8:", "more than one YAML document", "one scenario per file"}},
		{name: "plan header repeats a column", files: with(map[string]string{"plan.csv": "scenario,mass,runs,mass\ns.yaml,20 g,3,2 kg\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"plan.csv:1", "mass", "named twice", "columns 2 and 4"}},
		{name: "plan with absurd runs", files: with(map[string]string{"plan.csv": "scenario,mass,runs\ns.yaml,20 g,9200000000000000000\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"plan.csv:2", "runs", "from 0 to 10000"}},
		{name: "plan row names another file", files: with(map[string]string{"plan.csv": "scenario,mass,runs\nshadow,20 g,1\n", "shadow": "root:$6$saltsalt$hashhashhash:19000:0:99999:7:::\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"plan.csv:2", "scenario", ".yaml or .yml"}, notWant: []string{"$6$", "root"}},
		{name: "plan row names a non-scenario YAML", files: with(map[string]string{"plan.csv": "scenario,mass,runs\nsecret.yaml,20 g,1\n", "secret.yaml": "alice: $6$saltsalt$hashhashhash\nbob: $6$pepper$hash\n"}),
			args: []string{"portfolio", "{dir}/plan.csv"}, code: 1, want: []string{"secret.yaml:1", "does not look like a scenario"}, notWant: []string{"$6$", "alice", "bob"}},
		{name: "long unknown key is cut short", files: with(map[string]string{"s.yaml": caseScenario + strings.Repeat("x", 1000) + ": 1\n"}),
			args: []string{"check", "{dir}/s.yaml", "--prices", "{dir}/prices.csv"}, code: 1, want: []string{"s.yaml:8:", "not a known field", `xxx"…`},
			notWant: []string{strings.Repeat("x", 41)}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) { c.run(t) })
	}
}

// run writes the case's files, runs it, and checks the exit code, the
// message and that the folder is unchanged.
func (c badCase) run(t *testing.T) {
	dir := t.TempDir()
	for name, data := range c.files {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(data), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if c.setup != nil {
		c.setup(t, dir)
	}
	before := snapshot(t, dir)
	args := make([]string, len(c.args))
	for i, a := range c.args {
		args[i] = strings.ReplaceAll(a, "{dir}", dir)
	}
	out, errOut, err := runWithin(t, 20*time.Second, args...)
	msg := out + errOut
	if err != nil {
		msg += err.Error()
	}
	if got := exitCode(err); got != c.code {
		t.Errorf("exit %d, want %d; output:\n%s", got, c.code, msg)
	}
	for _, w := range c.want {
		if !strings.Contains(msg, w) {
			t.Errorf("message lacks %q:\n%s", w, msg)
		}
	}
	for _, w := range c.notWant {
		if strings.Contains(msg, w) {
			t.Errorf("message holds %q:\n%s", w, msg)
		}
	}
	if after := snapshot(t, dir); after != before {
		t.Errorf("the folder changed:\nbefore:\n%s\nafter:\n%s", before, after)
	}
}

// runWithin runs the command line and fails the test if it does not end in
// time (an input that blocks, such as a pipe with no writer).
func runWithin(t *testing.T, limit time.Duration, args ...string) (string, string, error) {
	t.Helper()
	type result struct {
		out, errOut string
		err         error
	}
	done := make(chan result, 1)
	go func() {
		var out, errOut bytes.Buffer
		err := run(context.Background(), args, &out, &errOut)
		done <- result{out.String(), errOut.String(), err}
	}()
	select {
	case r := <-done:
		return r.out, r.errOut, r.err
	case <-time.After(limit):
		t.Fatalf("%v still running after %v", args, limit)
		return "", "", nil
	}
}

// snapshot describes every entry of a folder (name, type, mode, size and,
// for regular files, a hash of the contents) without opening anything but
// regular files.
func snapshot(t *testing.T, dir string) string {
	t.Helper()
	var b strings.Builder
	err := filepath.WalkDir(dir, func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		fi, err := os.Lstat(path)
		if err != nil {
			return err
		}
		rel, _ := filepath.Rel(dir, path)
		fmt.Fprintf(&b, "%s %v %d", rel, fi.Mode(), fi.Size())
		if fi.Mode().IsRegular() && fi.Size() < 64<<20 {
			data, err := os.ReadFile(path)
			if err != nil {
				return err
			}
			fmt.Fprintf(&b, " %x", sha256.Sum256(data))
		}
		b.WriteString("\n")
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	return b.String()
}

func mkfifo(name string) func(*testing.T, string) {
	return func(t *testing.T, dir string) {
		if err := syscall.Mkfifo(filepath.Join(dir, name), 0o644); err != nil {
			t.Skipf("cannot make a pipe here: %v", err)
		}
	}
}

func symlink(target, name string) func(*testing.T, string) {
	return func(t *testing.T, dir string) {
		if err := os.Symlink(target, filepath.Join(dir, name)); err != nil {
			t.Skipf("cannot make a symbolic link here: %v", err)
		}
	}
}

func mkdir(name string) func(*testing.T, string) {
	return func(t *testing.T, dir string) {
		if err := os.Mkdir(filepath.Join(dir, name), 0o755); err != nil {
			t.Fatal(err)
		}
	}
}

// sparse makes a file of the given size that takes no disk space.
func sparse(name string, size int64) func(*testing.T, string) {
	return func(t *testing.T, dir string) {
		f, err := os.Create(filepath.Join(dir, name))
		if err != nil {
			t.Fatal(err)
		}
		defer f.Close()
		if err := f.Truncate(size); err != nil {
			t.Fatal(err)
		}
	}
}

// manyItems is n valid price lines with distinct names.
func manyItems(n int) string {
	var b strings.Builder
	for i := range n {
		fmt.Fprintf(&b, "reagent %d,kg,1.00,EUR,consumable,invented,2026-01-01,\n", i)
	}
	return b.String()
}
