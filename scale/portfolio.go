package scale

import (
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"path/filepath"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/quote"
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

// Limits of a plan file: its size, its rows and the runs of one row. A
// year's plan has tens of rows; a batch run more than 10 000 times a year
// is a production process, not a plan of laboratory batches, and the bound
// keeps every total far inside the integer range.
const (
	MaxPlanSize   = 1 << 20
	MaxPlanRows   = 10000
	MaxRunsPerRow = 10000
	maxPlanErrors = 200
)

// planColumns are the columns a plan may have.
var planColumns = []string{"scenario", "mass", "runs", "method"}

// ReadPlan reads a plan CSV with the header scenario,mass,runs and an
// optional method column. Every problem is reported, each with its line.
// A plan may have at most MaxPlanSize bytes and MaxPlanRows rows; runs lie
// from 0 to MaxRunsPerRow, masses within scenario.BatchRange, and each
// scenario is a .yaml or .yml file.
func ReadPlan(r io.Reader, file string) ([]PlanRow, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxPlanSize+1))
	if err != nil {
		return nil, fmt.Errorf("%s: %w", file, err)
	}
	if len(data) > MaxPlanSize {
		return nil, &PlanError{File: file, Line: 1, Msg: fmt.Sprintf("larger than %d bytes (1 MiB); a plan has one short line per batch, at most %d lines", MaxPlanSize, MaxPlanRows)}
	}
	cr := csv.NewReader(bytes.NewReader(data))
	cr.Comment = '#'
	cr.TrimLeadingSpace = true
	cr.FieldsPerRecord = -1
	header, err := cr.Read()
	if err != nil {
		return nil, &PlanError{File: file, Line: planErrLine(err, 1), Msg: "no readable header; the first line must be scenario,mass,runs (and optionally ,method)"}
	}
	col, errs := planHeader(file, header)
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	var rows []PlanRow
	for len(errs) < maxPlanErrors {
		rec, err := cr.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			errs = append(errs, &PlanError{File: file, Line: planErrLine(err, 0), Msg: "not valid CSV: " + csvMessage(err) + "; a value with a comma or a quote is written in double quotes, a quote inside doubled"})
			break
		}
		line, _ := cr.FieldPos(0)
		if len(rows) >= MaxPlanRows {
			errs = append(errs, &PlanError{File: file, Line: line, Msg: fmt.Sprintf("more than %d rows; a plan has at most %d", MaxPlanRows, MaxPlanRows)})
			break
		}
		row, rowErrs := planRow(file, line, rec, col)
		errs = append(errs, rowErrs...)
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

// planHeader maps the header's columns to their index, refusing missing,
// unknown and repeated columns.
func planHeader(file string, header []string) (map[string]int, []error) {
	col := map[string]int{}
	var errs []error
	for i, h := range header {
		name := strings.ToLower(strings.TrimSpace(strings.TrimPrefix(h, "\ufeff")))
		if !slices.Contains(planColumns, name) {
			errs = append(errs, &PlanError{File: file, Line: 1, Field: quote.Field(name), Msg: "unknown column; valid columns: scenario, mass, runs, method"})
			continue
		}
		if first, dup := col[name]; dup {
			errs = append(errs, &PlanError{File: file, Line: 1, Field: name, Msg: fmt.Sprintf("named twice, as columns %d and %d; name each column once", first+1, i+1)})
			continue
		}
		col[name] = i
	}
	for _, need := range planColumns[:3] {
		if _, ok := col[need]; !ok {
			errs = append(errs, &PlanError{File: file, Line: 1, Field: need, Msg: "missing column; the header must be scenario,mass,runs (and optionally ,method)"})
		}
	}
	return col, errs
}

// planRow reads one plan row.
func planRow(file string, line int, rec []string, col map[string]int) (PlanRow, []error) {
	var errs []error
	bad := func(field, format string, args ...any) {
		errs = append(errs, &PlanError{File: file, Line: line, Field: field, Msg: fmt.Sprintf(format, args...)})
	}
	get := func(name string) string {
		if i, ok := col[name]; ok && i < len(rec) {
			return strings.TrimSpace(rec[i])
		}
		return ""
	}
	row := PlanRow{Line: line, Scenario: get("scenario"), Method: strings.ToLower(get("method"))}
	switch ext := strings.ToLower(filepath.Ext(row.Scenario)); {
	case row.Scenario == "":
		bad("scenario", "empty; write the path of a scenario file, relative to the plan")
	case ext != ".yaml" && ext != ".yml":
		bad("scenario", "%s is not a scenario file; write the path of a .yaml or .yml scenario, relative to the plan", quote.Excerpt(row.Scenario))
	}
	mass := get("mass")
	if m, err := units.ParseAs(mass, units.Mass); err != nil {
		bad("mass", "%v", err)
	} else if err := scenario.CheckBatchMass(m); err != nil {
		bad("mass", "%s: %v", quote.Excerpt(mass), err)
	} else {
		row.MassKg = m
	}
	runs := get("runs")
	if n, err := strconv.Atoi(runs); err != nil || n < 0 || n > MaxRunsPerRow {
		bad("runs", "%s: write how many times the batch is run, a whole number from 0 to %d", quote.Excerpt(runs), MaxRunsPerRow)
	} else {
		row.Runs = n
	}
	return row, errs
}

// planErrLine is the line of a CSV error, or def when it has none.
func planErrLine(err error, def int) int {
	var pe *csv.ParseError
	if errors.As(err, &pe) && pe.Line > 0 {
		return pe.Line
	}
	return def
}

// csvMessage is the CSV error without its own position (the line is given).
func csvMessage(err error) string {
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		return pe.Err.Error()
	}
	return err.Error()
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
