package scenario

import (
	"math"
	"testing"
)

// A total of three or more volumes is added in id order, the same bits on
// every call whatever order the map gives: 0.1 + 0.2 + 0.3 is
// 0.6000000000000001 in that order and 0.6 when 0.1 comes last (IEEE 754 binary64).
func TestVolumesTotalIsInIDOrder(t *testing.T) {
	t.Parallel()
	a, b, c := 0.1, 0.2, 0.3 // variables: constants would be added exactly
	v := Volumes{"a": a, "b": b, "c": c}
	want := (a + b) + c
	for k := 0; k < 200; k++ {
		if got := v.Total(); math.Float64bits(got) != math.Float64bits(want) {
			t.Fatalf("call %d: total %v, want %v (a, b, c in order)", k, got, want)
		}
	}
	if two := (Volumes{"x": a, "y": b}).Total(); two != a+b {
		t.Errorf("two volumes: %v", two)
	}
}
