//go:build linux

package main

import (
	"bufio"
	"bytes"
	"fmt"
	"os"
	"os/exec"
	"strconv"
	"strings"
)

// peakRSS runs `sepcost args` in a child process (this test binary,
// running TestMemoryChild) and gives its peak resident set in bytes: the
// memory of the whole command, the Go runtime and the test binary
// included. The child reads its own VmHWM from /proc/self/status when the
// command ends; the rusage of a child is no measure here, since Linux
// carries the parent's high-water mark across the exec of a vfork'd child.
func peakRSS(args []string) (float64, error) {
	cmd := exec.Command(os.Args[0], "-test.run=^TestMemoryChild$")
	cmd.Env = append(os.Environ(), memoryArgsEnv+"="+strings.Join(args, memoryArgsSep))
	out, err := cmd.CombinedOutput()
	if err != nil {
		return 0, fmt.Errorf("child sepcost %s: %v: %s", strings.Join(args, " "), err, out)
	}
	sc := bufio.NewScanner(bytes.NewReader(out))
	for sc.Scan() {
		if kb, ok := strings.CutPrefix(sc.Text(), "VmHWM:"); ok {
			v, err := strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(kb), "kB")), 64)
			if err != nil {
				return 0, fmt.Errorf("child sepcost: VmHWM %q: %v", kb, err)
			}
			return v * 1024, nil
		}
	}
	return 0, fmt.Errorf("child sepcost: no VmHWM in its output: %s", out)
}

// ownPeakRSS is the VmHWM line of /proc/self/status.
func ownPeakRSS() (string, error) {
	data, err := os.ReadFile("/proc/self/status")
	if err != nil {
		return "", err
	}
	for line := range strings.SplitSeq(string(data), "\n") {
		if strings.HasPrefix(line, "VmHWM:") {
			return line, nil
		}
	}
	return "", fmt.Errorf("/proc/self/status has no VmHWM")
}
