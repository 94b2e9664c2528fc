// Package quote shortens and escapes a user's text before a message
// repeats it: a message that quotes a file quotes at most a short excerpt,
// with control characters shown as escapes.
package quote

import (
	"fmt"
	"regexp"
	"strings"
	"unicode/utf8"
)

// Max is the most characters of a user's text a message quotes.
const Max = 40

// Excerpt is s quoted and escaped (Go %q: control characters shown as
// escapes), cut to its first Max characters with "…" after the quote.
func Excerpt(s string) string {
	if utf8.RuneCountInString(s) <= Max {
		return fmt.Sprintf("%q", s)
	}
	return fmt.Sprintf("%q…", cut(s))
}

// cut is the first Max characters of s.
func cut(s string) string {
	n := 0
	for i := range s {
		if n == Max {
			return s[:i]
		}
		n++
	}
	return s
}

var plainField = regexp.MustCompile(`^[A-Za-z0-9_ .\[\]-]{1,80}$`)

// Field is a field or column name as written when it is plain (letters,
// digits, spaces, "_", ".", "-", brackets; at most 80) or empty, else its
// Excerpt.
func Field(f string) string {
	if f == "" || plainField.MatchString(f) {
		return f
	}
	return Excerpt(f)
}

// Args shortens, in place, every string argument that format prints with
// %q to its first Max characters and "…", so that a message built with
// fmt.Sprintf(format, args...) repeats no more than that of a file.
func Args(format string, args []any) {
	for _, i := range quotedArgs(format) {
		if i < len(args) {
			if s, ok := args[i].(string); ok && utf8.RuneCountInString(s) > Max {
				args[i] = cut(s) + "…"
			}
		}
	}
}

// quotedArgs lists the argument indexes that format prints with %q
// (formats with explicit argument indexes such as %[1]q are not used in
// messages and are not followed).
func quotedArgs(format string) []int {
	var out []int
	arg := 0
	for i := 0; i < len(format); i++ {
		if format[i] != '%' {
			continue
		}
		j := i + 1
		for j < len(format) && strings.IndexByte("+-# 0123456789.", format[j]) >= 0 {
			j++
		}
		if j >= len(format) {
			break
		}
		if format[j] != '%' {
			if format[j] == 'q' {
				out = append(out, arg)
			}
			arg++
		}
		i = j
	}
	return out
}
