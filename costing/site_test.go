package costing

import (
	"strings"
	"testing"

	"sepcost/costing/equipment"
)

// A site table without an evaporator (or without columns and cartridges)
// makes chromatography not feasible, with the reason naming the table;
// the other methods are unaffected.
func TestSiteWithoutEvaporator(t *testing.T) {
	t.Parallel()
	p, tab := demoPlan(t)
	eq, err := equipment.Read(strings.NewReader("item,kind,size,throughput,max_load,hourly_rate,ownership,price,currency,service_life,source\nc,column,40 mm,,,,owned,,,,\n"), "site.csv")
	if err != nil {
		t.Fatal(err)
	}
	q, err := PrepareWith(p.Scenario, Options{Equipment: eq})
	if err != nil {
		t.Fatal(err)
	}
	rs, err := q.Run([]float64{0.01}, tab)
	if err != nil {
		t.Fatal(err)
	}
	u := rs[0][0].Usage
	if u.Feasible || !strings.Contains(u.Reason, "site.csv lists no evaporator") {
		t.Errorf("chromatography: feasible %v, reason %q", u.Feasible, u.Reason)
	}
	if !rs[0][1].Usage.Feasible {
		t.Errorf("crystallization: %s", rs[0][1].Usage.Reason)
	}
}
