package equipment

import (
	"bytes"
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/shopspring/decimal"

	"sepcost/costing/prices"
	"sepcost/templates"
)

const header = "item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\n"

func TestDefaultReadsAndCoversEveryKind(t *testing.T) {
	t.Parallel()
	d := Default()
	for _, k := range Kinds {
		if len(d.OfKind(k)) == 0 {
			t.Errorf("the built-in table lists no %s", k)
		}
	}
	cols := d.OfKind(Column)
	// Columns beyond 300 mm exist at process scale (common practice: kilo
	// labs and pilot plants run steel columns of 450 mm and more).
	if last := cols[len(cols)-1]; last.Size <= 0.300 {
		t.Errorf("largest column %g m; want one beyond 300 mm", last.Size)
	}
	for _, c := range d.OfKind(Cartridge) {
		if c.MaxLoad <= 0 || c.MaxLoad >= c.Size || c.Throughput <= 0 || c.Price.Sign() <= 0 {
			t.Errorf("cartridge %s: load %g kg of %g kg silica, flow %g, price %s", c.Name, c.MaxLoad, c.Size, c.Throughput, c.Price)
		}
	}
	// A bench rotary evaporator distils about 1–2 L/h of common eluents
	// (common practice); the built-in smallest is 2 L/h.
	if ev := d.OfKind(Evaporator); math.Abs(ev[0].Throughput*3600e3-2) > 1e-9 {
		t.Errorf("smallest evaporator %g L/h, want 2", ev[0].Throughput*3600e3)
	}
}

func TestReadReportsFileLineFieldAndWhatIsValid(t *testing.T) {
	t.Parallel()
	in := header +
		"a,column,,,,,owned,,,,\n" + // line 2: size missing
		"b,pump,1 L,,,,owned,,,,\n" + // line 3: unknown kind
		"c,evaporator,,2 kg,,,owned,,,,\n" + // line 4: throughput of the wrong dimension
		"d,cartridge,40 g,40 mL/min,4 g,,to buy,,EUR,,\n" + // line 5: cartridge without a price
		"e,reactor,20 L,,,-3,owned,,EUR,,\n" + // line 6: negative rate
		"f,still,20 L,,,,to buy,900,EUR,,\n" + // line 7: no service life
		"g,column,10 mm,,,,rented,,,,\n" + // line 8: ownership word
		"a,column,20 mm,,,,owned,,,,\n" + // line 9: fine (a on line 2 was refused)
		"h,column,3 m,,,,owned,,,,\n" + // line 10: wider than any column
		"i,cartridge,40 g,40 mL/min,50 g,,to buy,18,EUR,,\n" // line 11: load above the silica
	_, err := Read(strings.NewReader(in), "eq.csv")
	if !errors.Is(err, ErrInvalid) {
		t.Fatalf("want ErrInvalid, got %v", err)
	}
	want := []string{
		"eq.csv:2: size: empty; write",
		`eq.csv:3: kind: "pump" is not a kind; write one of column, cartridge`,
		"eq.csv:4: throughput:",
		"eq.csv:5: price: empty",
		`eq.csv:6: hourly_rate: "-3" is negative`,
		"eq.csv:7: service_life: empty",
		`eq.csv:8: ownership: "rented": write "owned" or "to buy"`,
		`eq.csv:10: size: "3 m" is more than any column`,
		`eq.csv:11: max_load: "50 g" is more than the "40 g" of silica`,
	}
	for _, w := range want {
		if !strings.Contains(err.Error(), w) {
			t.Errorf("missing %q in\n%v", w, err)
		}
	}
	if strings.Contains(err.Error(), "eq.csv:9") {
		t.Errorf("line 9 is valid:\n%v", err)
	}
}

func TestReadRefusesDuplicatesMixedCurrenciesAndEmptyTables(t *testing.T) {
	t.Parallel()
	in := header + "a,column,10 mm,,,5,owned,,EUR,,\nA,column,20 mm,,,,owned,,,,\nb,column,20 mm,,,5,owned,,USD,,\n"
	_, err := Read(strings.NewReader(in), "eq.csv")
	for _, w := range []string{`eq.csv:3: item: "A" is already listed on line 2`, "eq.csv:4: currency: USD here but EUR on line 2"} {
		if err == nil || !strings.Contains(err.Error(), w) {
			t.Errorf("want %q, got %v", w, err)
		}
	}
	if _, err := Read(strings.NewReader(header), "eq.csv"); err == nil || !strings.Contains(err.Error(), "lists no equipment") {
		t.Errorf("empty table: %v", err)
	}
	if _, err := Read(strings.NewReader("item,kind\n"), "eq.csv"); err == nil || !strings.Contains(err.Error(), `missing column "size"`) {
		t.Errorf("short header: %v", err)
	}
}

func TestWithPricesAddsChargesInTheSameCurrency(t *testing.T) {
	t.Parallel()
	pt, err := prices.Read(bytes.NewReader(templates.Prices), "prices.csv")
	if err != nil {
		t.Fatal(err)
	}
	in := header +
		"steel column,column,450 mm,,,40.00,owned,,EUR,,\n" +
		"new still,still,50 L,,,,to buy,20000,EUR,10000 h,\n" +
		"cartridge 40 g,cartridge,40 g,40 mL/min,4 g,,to buy,18.00,EUR,,\n" +
		"glass column,column,20 mm,,,,owned,,,,\n"
	e, err := Read(strings.NewReader(in), "eq.csv")
	if err != nil {
		t.Fatal(err)
	}
	got, err := e.WithPrices(pt)
	if err != nil {
		t.Fatal(err)
	}
	// Straight-line wear: 20000 over 10000 h of use is 2 per hour.
	want := map[string]string{HourItem("steel column"): "40", HourItem("new still"): "2", UseItem("cartridge 40 g"): "18"}
	for name, p := range want {
		i, ok := got.Find(name)
		if !ok || !got.Items[i].Price.Equal(mustDec(p)) {
			t.Errorf("%s: found %v, price %v, want %s", name, ok, got.Items[i].Price, p)
		}
	}
	if _, ok := got.Find(HourItem("glass column")); ok {
		t.Error("an owned item without a rate is not charged")
	}
	if again, _ := e.WithPrices(got); again != got {
		t.Error("WithPrices on a table that already holds the rows must return it unchanged")
	}
	usd := header + "steel column,column,450 mm,,,40.00,owned,,USD,,\n"
	e2, _ := Read(strings.NewReader(usd), "eq.csv")
	if _, err := e2.WithPrices(pt); err == nil || !strings.Contains(err.Error(), "eq.csv:2: currency") {
		t.Errorf("currency mismatch: %v", err)
	}
}

func mustDec(s string) (d decimal.Decimal) {
	d, err := decimal.NewFromString(s)
	if err != nil {
		panic(err)
	}
	return d
}
