package costing

import (
	"strings"
	"testing"

	"sepcost/costing/chrom"
	"sepcost/costing/usage"
)

// 10 kg of the demo crude runs on process-scale equipment the built-in
// equipment table lists (a steel process column or prepacked cartridges,
// and an evaporator faster than a bench one), in one to four working weeks
// of elapsed time (common practice: a kilo-lab or pilot group plans a
// chromatography of about ten kilograms over a few weeks, not months), with
// a warning that it exceeds one chemist's working week, and the choice of
// loading and equipment said in a note.
func TestDemoTenKilogramsOnProcessEquipment(t *testing.T) {
	t.Parallel()
	p, tab := demoPlan(t)
	r, err := p.RunOne(0, 10, tab)
	if err != nil {
		t.Fatal(err)
	}
	u := r.Usage
	if u.Method != chrom.Method || !u.Feasible {
		t.Fatalf("%s: %s", u.Method, u.Reason)
	}
	if !strings.Contains(u.Equipment, "process column") && !strings.Contains(u.Equipment, "cartridge") {
		t.Errorf("10 kg on %q", u.Equipment)
	}
	if strings.Contains(u.Equipment, "rotary evaporator 1 L") {
		t.Errorf("10 kg evaporated on a bench evaporator: %q", u.Equipment)
	}
	days, _ := u.Figure("working_days")
	if days.SI < 2 || days.SI > 20 {
		t.Errorf("%.1f working days", days.SI)
	}
	var chosen, week bool
	for _, n := range u.Notes {
		chosen = chosen || strings.HasPrefix(n.Text, "Chosen as the cheapest per gram")
		week = week || (n.Level == usage.Warning && strings.Contains(n.Text, "working week"))
	}
	if !chosen || !week {
		t.Errorf("notes: chosen %v, working-week warning %v", chosen, week)
	}
	t.Logf("10 kg: %s, %.1f working days", u.Equipment, days.SI)
}
