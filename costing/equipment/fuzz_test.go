package equipment

import (
	"errors"
	"strings"
	"testing"

	"sepcost/templates"
)

// Read never panics, and either returns a table whose items all have a
// known kind and a positive size where one is required, or an error that
// unwraps to ErrInvalid or names the file.
func FuzzRead(f *testing.F) {
	f.Add(string(templates.Equipment))
	f.Add(header + "a,column,10 mm,,,,owned,,,,\n")
	f.Add(header + "a,cartridge,40 g,40 mL/min,4 g,,to buy,18,EUR,,\n")
	f.Add("\uFEFF" + header + "\"a,b\",still,20 L,,,1e3,to buy,5,EUR,0 h,\n")
	f.Fuzz(func(t *testing.T, in string) {
		tb, err := Read(strings.NewReader(in), "eq.csv")
		if err != nil {
			if !errors.Is(err, ErrInvalid) && !strings.Contains(err.Error(), "eq.csv") {
				t.Fatalf("error without the file name: %v", err)
			}
			return
		}
		for _, it := range tb.Items {
			if _, ok := SizeDim[it.Kind]; !ok {
				t.Fatalf("kind %q accepted", it.Kind)
			}
			if it.Kind != Evaporator && !(it.Size > 0) {
				t.Fatalf("%s: size %g accepted", it.Name, it.Size)
			}
			if it.Rate.Sign() < 0 || it.Price.Sign() < 0 {
				t.Fatalf("%s: negative money accepted", it.Name)
			}
		}
	})
}
