package source

import (
	"fmt"
	"strings"
)

// suggest words the help for an unknown setting key: the nearest known key
// by edit distance when one is close ("did you mean ...?"), then the keys
// of the same method (the part before the first dot), or else the
// methods' prefixes, rather than every key of every method.
func (s Set) suggest(key string) string {
	keys := s.Keys()
	best, bestD := "", -1
	for _, k := range keys {
		if d := editDistance(strings.ToLower(key), k); bestD < 0 || d < bestD {
			best, bestD = k, d
		}
	}
	var parts []string
	if best != "" && bestD <= max(2, len([]rune(key))/4) {
		parts = append(parts, fmt.Sprintf("did you mean %q?", best))
	}
	method, _, _ := strings.Cut(key, ".")
	var same []string
	prefixes := map[string]bool{}
	var order []string
	for _, k := range keys {
		m, _, _ := strings.Cut(k, ".")
		if m == method {
			same = append(same, k)
		}
		if !prefixes[m] {
			prefixes[m] = true
			order = append(order, m+".")
		}
	}
	if len(same) > 0 {
		parts = append(parts, fmt.Sprintf("valid settings of %s: %s", method, strings.Join(same, ", ")))
	} else {
		parts = append(parts, "valid settings begin with "+strings.Join(order, ", "))
	}
	return strings.Join(parts, " ")
}

// editDistance is the Levenshtein distance between a and b: the fewest
// single-character insertions, deletions and substitutions that turn one
// into the other (V. I. Levenshtein, "Binary codes capable of correcting
// deletions, insertions, and reversals", Soviet Physics Doklady 10, 1966,
// 707–710; the two-row dynamic programme, from memory).
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}
