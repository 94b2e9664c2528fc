package main

import (
	"fmt"
	"io"
	"unicode/utf8"
)

// safeWriter passes text on with every control character that a terminal
// would act on (escape sequences, carriage return, backspace, bell, C1
// controls, bidirectional overrides) written as a visible escape, so that
// text from a user's file cannot clear, recolour or rewrite the terminal.
// Tab and newline pass. It remembers the first write error, so that a
// report lost to a full disk or a closed pipe gives a non-zero exit.
type safeWriter struct {
	w   io.Writer
	err error
}

func (s *safeWriter) Write(p []byte) (int, error) {
	if s.err != nil {
		return 0, s.err
	}
	if _, err := s.w.Write(sanitize(p)); err != nil {
		s.err = err
		return 0, err
	}
	return len(p), nil
}

// sanitize returns p with terminal controls escaped (p itself when clean).
func sanitize(p []byte) []byte {
	clean := true
	for i := 0; i < len(p); {
		r, n := utf8.DecodeRune(p[i:])
		if unsafeRune(r, n) {
			clean = false
			break
		}
		i += n
	}
	if clean {
		return p
	}
	out := make([]byte, 0, len(p)+16)
	for i := 0; i < len(p); {
		r, n := utf8.DecodeRune(p[i:])
		switch {
		case unsafeRune(r, n) && r < 0x80:
			out = fmt.Appendf(out, `\x%02x`, r)
		case unsafeRune(r, n):
			out = fmt.Appendf(out, `\u%04x`, r)
		default:
			out = append(out, p[i:i+n]...)
		}
		i += n
	}
	return out
}

// unsafeRune reports a control a terminal acts on: C0 except tab and
// newline, DEL, C1, and the bidirectional embedding, override and isolate
// marks (Unicode Standard Annex #9).
func unsafeRune(r rune, size int) bool {
	if r == utf8.RuneError && size == 1 {
		return false // a stray byte: passed on as it is, terminals show it as a replacement
	}
	switch {
	case r == '\t' || r == '\n':
		return false
	case r < 0x20 || r == 0x7f:
		return true
	case r >= 0x80 && r <= 0x9f:
		return true
	case r >= 0x202a && r <= 0x202e, r >= 0x2066 && r <= 0x2069:
		return true
	}
	return false
}
