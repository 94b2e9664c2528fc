package scale

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"sort"
	"strconv"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/scenario"
	"sepcost/costing/units"
	"sepcost/costing/usage"
)

// ErrPlan is the sentinel every plan-file error unwraps to.
var ErrPlan = errors.New("invalid plan")

// PlanError is one problem in a plan file, with its line.
type PlanError struct {
	File  string
	Line  int
	Field string
	Msg   string
}

func (e *PlanError) Error() string {
	if e.Field == "" {
		return fmt.Sprintf("%s:%d: %s", e.File, e.Line, e.Msg)
	}
	return fmt.Sprintf("%s:%d: %s: %s", e.File, e.Line, e.Field, e.Msg)
}

// Unwrap returns ErrPlan.
func (e *PlanError) Unwrap() error { return ErrPlan }

// PlanRow is one row of a year's plan: a scenario, a batch mass, how many
// times the batch is run, and optionally a forced method.
type PlanRow struct {
	Line     int
	Scenario string // path as written (relative to the plan file)
	MassKg   float64
	Runs     int
	Method   string // "" lets the decision choose
}

// MaxPlanRows caps a plan file; a year's plan has tens of rows.
const MaxPlanRows = 10000

// ReadPlan reads a plan CSV with the header scenario,mass,runs and an
// optional method column. Every problem is reported, each with its line.
func ReadPlan(r io.Reader, file string) ([]PlanRow, error) {
	cr := csv.NewReader(r)
	cr.Comment = '#'
	cr.TrimLeadingSpace = true
	cr.FieldsPerRecord = -1
	header, err := cr.Read()
	if err != nil {
		return nil, &PlanError{File: file, Line: 1, Msg: "no header; the first line must be scenario,mass,runs (and optionally ,method)"}
	}
	col := map[string]int{}
	for i, h := range header {
		col[strings.ToLower(strings.TrimSpace(strings.TrimPrefix(h, "\ufeff")))] = i
	}
	var errs []error
	for _, need := range []string{"scenario", "mass", "runs"} {
		if _, ok := col[need]; !ok {
			errs = append(errs, &PlanError{File: file, Line: 1, Field: need, Msg: "missing column; the header must be scenario,mass,runs (and optionally ,method)"})
		}
	}
	for h := range col {
		switch h {
		case "scenario", "mass", "runs", "method":
		default:
			errs = append(errs, &PlanError{File: file, Line: 1, Field: h, Msg: "unknown column; valid columns: scenario, mass, runs, method"})
		}
	}
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	var rows []PlanRow
	for {
		rec, err := cr.Read()
		if err == io.EOF {
			break
		}
		line, _ := cr.FieldPos(0)
		if err != nil {
			errs = append(errs, &PlanError{File: file, Line: line, Msg: "not valid CSV: " + err.Error()})
			break
		}
		if len(rows) >= MaxPlanRows {
			errs = append(errs, &PlanError{File: file, Line: line, Msg: fmt.Sprintf("more than %d rows", MaxPlanRows)})
			break
		}
		get := func(name string) string {
			if i, ok := col[name]; ok && i < len(rec) {
				return strings.TrimSpace(rec[i])
			}
			return ""
		}
		row := PlanRow{Line: line, Scenario: get("scenario"), Method: strings.ToLower(get("method"))}
		if row.Scenario == "" {
			errs = append(errs, &PlanError{File: file, Line: line, Field: "scenario", Msg: "empty; write the path of a scenario file, relative to the plan"})
		}
		if m, err := units.ParseAs(get("mass"), units.Mass); err != nil {
			errs = append(errs, &PlanError{File: file, Line: line, Field: "mass", Msg: err.Error()})
		} else if m <= 0 {
			errs = append(errs, &PlanError{File: file, Line: line, Field: "mass", Msg: "must be above zero"})
		} else {
			row.MassKg = m
		}
		if n, err := strconv.Atoi(get("runs")); err != nil || n < 0 {
			errs = append(errs, &PlanError{File: file, Line: line, Field: "runs", Msg: fmt.Sprintf("%q: write how many times the batch is run, a whole number from 0 up", get("runs"))})
		} else {
			row.Runs = n
		}
		rows = append(rows, row)
	}
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	if len(rows) == 0 {
		return nil, &PlanError{File: file, Line: 2, Msg: "no rows; add one line per scenario, mass and number of runs"}
	}
	return rows, nil
}

// PortfolioLine is one plan row costed: the method chosen (or forced) and
// the per-batch result, multiplied by the number of runs.
type PortfolioLine struct {
	PlanRow
	Title    string // the scenario's name
	Method   string // the method used
	Forced   bool   // the plan forced the method
	Result   Result // one batch
	Waste    []WasteRow
	Total    decimal.Decimal // per-batch total × runs
	Cautions []string
}

// ClassTotal is the waste of one class over the plan.
type ClassTotal struct {
	Class    usage.WasteClass
	Kg       float64
	Disposal decimal.Decimal
}

// CodeTotal is the waste mass carrying one suggested code.
type CodeTotal struct {
	Scheme, Code, Title string
	Kg                  float64
}

// SolventTotal is one solvent's purchases and recovery over the plan.
type SolventTotal struct {
	Solvent     string
	Litres      float64 // bought
	RecoveredL  float64 // credited as recovered for reuse
	Cost        decimal.Decimal
	RecoveredCr decimal.Decimal
}

// Portfolio is a year's plan rolled up.
type Portfolio struct {
	File          string
	Currency      string
	Places        int32
	Lines         []PortfolioLine
	Total         decimal.Decimal
	ByMethod      map[string]decimal.Decimal
	Classes       []ClassTotal
	Codes         []CodeTotal
	Solvents      []SolventTotal
	HoursElapsed  float64
	HoursAttended float64
	Cautions      []string
}

// Loader turns a plan row's scenario path into a prepared plan.
type Loader func(path string) (*costing.Plan, error)

// BuildPortfolio costs every plan row: the decision's method at the row's
// mass unless the row forces one, times its runs, and rolls the plan up.
// Totals are sums of the per-row totals, themselves exact multiples of the
// per-batch ledger totals, so the year reconciles to the cent.
func BuildPortfolio(file string, rows []PlanRow, load Loader, t *prices.Table) (*Portfolio, error) {
	pf := &Portfolio{File: file, Currency: t.Currency, Places: prices.MinorUnits(t.Currency), ByMethod: map[string]decimal.Decimal{}}
	classes := map[usage.WasteClass]*ClassTotal{}
	codes := map[string]*CodeTotal{}
	solvents := map[string]*SolventTotal{}
	cautions := map[string]bool{}
	var errs []error
	for _, row := range rows {
		p, err := load(row.Scenario)
		if err != nil {
			errs = append(errs, &PlanError{File: file, Line: row.Line, Field: "scenario", Msg: err.Error()})
			continue
		}
		line, err := costRow(p, row, t)
		if err != nil {
			errs = append(errs, &PlanError{File: file, Line: row.Line, Msg: err.Error()})
			continue
		}
		pf.Lines = append(pf.Lines, line)
		pf.Total = pf.Total.Add(line.Total)
		pf.ByMethod[line.Method] = pf.ByMethod[line.Method].Add(line.Total)
		runs := float64(row.Runs)
		el, at := line.Result.Usage.Hours()
		pf.HoursElapsed += el * runs
		pf.HoursAttended += at * runs
		for _, w := range line.Waste {
			c := classes[w.Stream.Class]
			if c == nil {
				c = &ClassTotal{Class: w.Stream.Class}
				classes[w.Stream.Class] = c
			}
			c.Kg += w.Kg * runs
			c.Disposal = c.Disposal.Add(w.Disposal.Mul(decimal.NewFromInt(int64(row.Runs))))
			for _, code := range w.Classification.Codes {
				k := code.Scheme + " " + code.Code
				ct := codes[k]
				if ct == nil {
					ct = &CodeTotal{Scheme: code.Scheme, Code: code.Code, Title: code.Title}
					codes[k] = ct
				}
				ct.Kg += w.Kg * runs
			}
		}
		for _, l := range line.Result.Ledger.Lines {
			if _, ok := p.Scenario.Solvents.Find(l.Demand.Item); !ok || l.Demand.Dim != units.Volume {
				continue
			}
			st := solvents[l.Demand.Item]
			if st == nil {
				st = &SolventTotal{Solvent: l.Demand.Item}
				solvents[l.Demand.Item] = st
			}
			amount := l.Amount.Mul(decimal.NewFromInt(int64(row.Runs)))
			if l.Demand.Group == usage.Credit {
				st.RecoveredL += -l.Demand.Qty * 1000 * runs
				st.RecoveredCr = st.RecoveredCr.Add(amount)
			} else {
				st.Litres += l.Demand.Qty * 1000 * runs
				st.Cost = st.Cost.Add(amount)
			}
		}
		for _, c := range line.Cautions {
			if !cautions[c] {
				cautions[c] = true
				pf.Cautions = append(pf.Cautions, c)
			}
		}
	}
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	for _, c := range usage.WasteClasses {
		if ct := classes[c]; ct != nil {
			pf.Classes = append(pf.Classes, *ct)
		}
	}
	for _, ct := range codes {
		pf.Codes = append(pf.Codes, *ct)
	}
	sort.Slice(pf.Codes, func(i, j int) bool {
		if pf.Codes[i].Scheme != pf.Codes[j].Scheme {
			return pf.Codes[i].Scheme < pf.Codes[j].Scheme
		}
		return pf.Codes[i].Code < pf.Codes[j].Code
	})
	for _, st := range solvents {
		pf.Solvents = append(pf.Solvents, *st)
	}
	sort.Slice(pf.Solvents, func(i, j int) bool { return pf.Solvents[i].Solvent < pf.Solvents[j].Solvent })
	return pf, nil
}

// costRow runs one plan row.
func costRow(p *costing.Plan, row PlanRow, t *prices.Table) (PortfolioLine, error) {
	line := PortfolioLine{PlanRow: row, Title: p.Scenario.Name, Cautions: p.Cautions()}
	j := -1
	if row.Method != "" {
		for k, name := range p.MethodNames() {
			if name == row.Method {
				j = k
			}
		}
		if j < 0 {
			return line, fmt.Errorf("method %q: write one of %s, or leave it empty to let sepcost choose", row.Method, strings.Join(p.MethodNames(), ", "))
		}
		line.Forced = true
	} else {
		d, err := Decide(p, t, row.MassKg)
		if err != nil {
			return line, err
		}
		if d.Winner == "" {
			return line, fmt.Errorf("no method is feasible for %s at %s", p.Scenario.Name, scenario.FormatMass(row.MassKg))
		}
		for k, name := range p.MethodNames() {
			if name == d.Winner {
				j = k
			}
		}
	}
	res, err := p.RunOne(j, row.MassKg, t)
	if err != nil {
		return line, err
	}
	if !res.Usage.Feasible {
		return line, fmt.Errorf("%s is not feasible for %s at %s: %s", p.MethodNames()[j], p.Scenario.Name, scenario.FormatMass(row.MassKg), res.Usage.Reason)
	}
	line.Method = p.MethodNames()[j]
	line.Result = res
	line.Total = res.Ledger.Total.Mul(decimal.NewFromInt(int64(row.Runs)))
	line.Waste = wasteRows(p, []float64{row.MassKg}, []string{line.Method}, [][]Result{{res}})
	return line, nil
}
