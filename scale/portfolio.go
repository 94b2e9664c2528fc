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
	"time"

	"github.com/shopspring/decimal"

	"sepcost/costing"
	"sepcost/costing/prices"
	"sepcost/costing/problem"
	"sepcost/costing/quote"
	"sepcost/costing/scenario"
	"sepcost/costing/units"
	"sepcost/costing/usage"
	"sepcost/costing/waste"
	"sepcost/scale/campaign"
)

// ErrPlan is the sentinel every plan-file error unwraps to.
var ErrPlan = errors.New("invalid plan")

// PlanError is one problem in a plan file, with its line; it unwraps to
// ErrPlan.
type PlanError = problem.Problem

// PlanRow is one row of a year's plan: a scenario, a batch mass, how many
// times the batch is run, and optionally a forced method.
type PlanRow struct {
	Line        int
	Scenario    string // path as written (relative to the plan file)
	MassKg      float64
	Runs        int
	Method      string      // "" lets the decision choose
	Date        string      // when the runs are planned, YYYY-MM-DD; "" when not given
	Development Development // where the row's one-time costs are charged
}

// Development says which rows of a plan bear a method's one-time costs
// (its development).
type Development string

// Development choices, written in the plan's development column.
const (
	// PerScenario charges a scenario's one-time costs for a method once in
	// the plan, on the first row that runs it (the default; an empty value
	// means the same).
	PerScenario Development = "scenario"
	// PerRow charges them on this row, as a campaign of its own.
	PerRow Development = "row"
	// Developed charges nothing: the method is already developed.
	Developed Development = "done"
)

// Quarter is the calendar quarter of a YYYY-MM-DD date, "2026-Q3"; "" when
// the date is empty or not a date.
func Quarter(date string) string {
	d, err := time.Parse("2006-01-02", date)
	if err != nil {
		return ""
	}
	return fmt.Sprintf("%d-Q%d", d.Year(), (int(d.Month())+2)/3)
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
var planColumns = []string{"scenario", "mass", "runs", "method", "date", "development"}

// ReadPlan reads a plan CSV with the header scenario,mass,runs and the
// optional columns method, date (YYYY-MM-DD, for the roll-up by quarter)
// and development (scenario, row or done: see Development). Every problem
// is reported, each with its line. A plan may have at most MaxPlanSize
// bytes and MaxPlanRows rows; runs lie from 0 to MaxRunsPerRow, masses
// within scenario.BatchRange, and each scenario is a .yaml or .yml file.
func ReadPlan(r io.Reader, file string) ([]PlanRow, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxPlanSize+1))
	if err != nil {
		return nil, fmt.Errorf("%s: %w", file, err)
	}
	if len(data) > MaxPlanSize {
		return nil, &PlanError{Of: ErrPlan, File: file, Line: 1, Msg: fmt.Sprintf("larger than %d bytes (1 MiB); a plan has one short line per batch, at most %d lines", MaxPlanSize, MaxPlanRows)}
	}
	cr := csv.NewReader(bytes.NewReader(data))
	cr.Comment = '#'
	cr.TrimLeadingSpace = true
	cr.FieldsPerRecord = -1
	header, err := cr.Read()
	if err != nil {
		return nil, &PlanError{Of: ErrPlan, File: file, Line: planErrLine(err, 1), Msg: "no readable header; the first line must be scenario,mass,runs (and optionally ,method)"}
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
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: planErrLine(err, 0), Msg: "not valid CSV: " + csvMessage(err) + "; a value with a comma or a quote is written in double quotes, a quote inside doubled"})
			break
		}
		line, _ := cr.FieldPos(0)
		if len(rows) >= MaxPlanRows {
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: line, Msg: fmt.Sprintf("more than %d rows; a plan has at most %d", MaxPlanRows, MaxPlanRows)})
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
		return nil, &PlanError{Of: ErrPlan, File: file, Line: 2, Msg: "no rows; add one line per scenario, mass and number of runs"}
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
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: 1, Field: quote.Field(name), Msg: "unknown column; valid columns: scenario, mass, runs, method, date, development"})
			continue
		}
		if first, dup := col[name]; dup {
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: 1, Field: name, Msg: fmt.Sprintf("named twice, as columns %d and %d; name each column once", first+1, i+1)})
			continue
		}
		col[name] = i
	}
	for _, need := range planColumns[:3] {
		if _, ok := col[need]; !ok {
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: 1, Field: need, Msg: "missing column; the header must be scenario,mass,runs (and optionally ,method)"})
		}
	}
	return col, errs
}

// planRow reads one plan row.
func planRow(file string, line int, rec []string, col map[string]int) (PlanRow, []error) {
	var errs []error
	bad := func(field, format string, args ...any) {
		errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: line, Field: field, Msg: fmt.Sprintf(format, args...)})
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
	if row.Date = get("date"); row.Date != "" && Quarter(row.Date) == "" {
		bad("date", "%s: write the date as YYYY-MM-DD, e.g. 2026-03-31, or leave it empty", quote.Excerpt(row.Date))
	}
	switch dev := Development(strings.ToLower(get("development"))); dev {
	case "":
		row.Development = PerScenario
	case PerScenario, PerRow, Developed:
		row.Development = dev
	default:
		bad("development", "%s: write scenario (one-time costs once per scenario in the plan, the default), row (on this row) or done (already developed)", quote.Excerpt(string(dev)))
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

// PortfolioLine is one plan row costed as a campaign: the method chosen
// (or forced), one batch priced at the bands of the row's purchases, its
// recurring cost times the runs, and the one-time costs when this row
// bears them.
type PortfolioLine struct {
	PlanRow
	Title    string // the scenario's name
	Method   string // the method used
	Forced   bool   // the plan forced the method
	Result   Result // one batch, priced at the row's campaign bands
	Waste    []WasteRow
	PerBatch decimal.Decimal // recurring cost of one batch (one-time lines left out)
	OneTime  decimal.Decimal // one-time costs charged on this row (zero when charged elsewhere or done)
	Total    decimal.Decimal // PerBatch × runs + OneTime
	Quarter  string          // calendar quarter of Date, "" without a date
	Cautions []string
}

// QuarterTotal is the plan's cost in one calendar quarter.
type QuarterTotal struct {
	Quarter string // "2026-Q1"; "" for rows without a date
	Total   decimal.Decimal
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
	OneTime       decimal.Decimal // one-time costs in Total, each charged once
	ByMethod      map[string]decimal.Decimal
	Quarters      []QuarterTotal // by calendar quarter, in order; rows without a date last
	Classes       []ClassTotal
	Codes         []CodeTotal
	Solvents      []SolventTotal
	HoursElapsed  float64
	HoursAttended float64
	Cautions      []string
}

// Loader turns a plan row's scenario path into a prepared plan.
// BuildPortfolio calls it once per distinct path.
type Loader func(path string) (*costing.Plan, error)

// BuildPortfolio costs every plan row as a campaign of its runs: the
// method cheapest per gram over the row's campaign unless the row forces
// one, the recurring cost times the runs, and the one-time costs once per
// scenario and method in the plan (or as the row's development column
// says), then rolls the plan up. Totals are sums of the row totals, each
// an exact multiple of a batch's rounded lines plus the rounded one-time
// lines, so the year reconciles to the cent.
func BuildPortfolio(file string, rows []PlanRow, load Loader, t *prices.Table) (*Portfolio, error) {
	pf := &Portfolio{File: file, Currency: t.Currency, Places: prices.MinorUnits(t.Currency), ByMethod: map[string]decimal.Decimal{}}
	roll := &rollUp{classes: map[usage.WasteClass]*ClassTotal{}, codes: map[string]*CodeTotal{}, solvents: map[string]*SolventTotal{},
		cautions: map[string]bool{}, quarters: map[string]decimal.Decimal{}}
	charged := map[string]bool{}
	var errs []error
	// Each scenario file is read and prepared once per run, however many
	// rows name it; a file that fails fails on every row that names it.
	type loaded struct {
		p   *costing.Plan
		err error
	}
	plans := map[string]loaded{}
	runs := newRunMemo()
	for _, row := range rows {
		l, ok := plans[row.Scenario]
		if !ok {
			l.p, l.err = load(row.Scenario)
			plans[row.Scenario] = l
		}
		p, err := l.p, l.err
		if err != nil {
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: row.Line, Field: "scenario", Msg: err.Error()})
			continue
		}
		line, err := costRow(p, row, t, charged, runs)
		if err != nil {
			errs = append(errs, &PlanError{Of: ErrPlan, File: file, Line: row.Line, Msg: err.Error()})
			continue
		}
		pf.Lines = append(pf.Lines, line)
		pf.Total = pf.Total.Add(line.Total)
		pf.OneTime = pf.OneTime.Add(line.OneTime)
		pf.ByMethod[line.Method] = pf.ByMethod[line.Method].Add(line.Total)
		roll.add(pf, p, line)
	}
	if len(errs) > 0 {
		return nil, errors.Join(errs...)
	}
	roll.finish(pf)
	return pf, nil
}

// rollUp gathers a plan's waste, solvent, cautions and quarters.
type rollUp struct {
	classes  map[usage.WasteClass]*ClassTotal
	codes    map[string]*CodeTotal
	solvents map[string]*SolventTotal
	cautions map[string]bool
	quarters map[string]decimal.Decimal
}

// add rolls one costed row into the plan: per-batch quantities times the
// runs, one-time lines once when the row bears them.
func (r *rollUp) add(pf *Portfolio, p *costing.Plan, line PortfolioLine) {
	runs := float64(line.Runs)
	nRuns := decimal.NewFromInt(int64(line.Runs))
	r.quarters[line.Quarter] = r.quarters[line.Quarter].Add(line.Total)
	el, at := line.Result.Usage.Hours()
	pf.HoursElapsed += el * runs
	pf.HoursAttended += at * runs
	for _, w := range line.Waste {
		c := r.classes[w.Stream.Class]
		if c == nil {
			c = &ClassTotal{Class: w.Stream.Class}
			r.classes[w.Stream.Class] = c
		}
		c.Kg += w.Kg * runs
		c.Disposal = c.Disposal.Add(w.Disposal.Mul(nRuns))
		for _, code := range w.Classification.Codes {
			k := code.Scheme + " " + code.Code
			ct := r.codes[k]
			if ct == nil {
				ct = &CodeTotal{Scheme: code.Scheme, Code: code.Code, Title: code.Title}
				r.codes[k] = ct
			}
			ct.Kg += w.Kg * runs
		}
	}
	once := 0.0
	if line.OneTime.IsPositive() {
		once = 1
	}
	for _, l := range line.Result.Ledger.Lines {
		if _, ok := p.Scenario.Solvents.Find(l.Demand.Item); !ok || l.Demand.Dim != units.Volume {
			continue
		}
		st := r.solvents[l.Demand.Item]
		if st == nil {
			st = &SolventTotal{Solvent: l.Demand.Item}
			r.solvents[l.Demand.Item] = st
		}
		n := runs
		if l.Demand.Group == usage.OneTime {
			n = once
		}
		amount := l.Amount.Mul(decimal.NewFromFloat(n))
		if l.Demand.Group == usage.Credit {
			st.RecoveredL += -l.Demand.Qty * 1000 * n
			st.RecoveredCr = st.RecoveredCr.Add(amount)
		} else {
			st.Litres += l.Demand.Qty * 1000 * n
			st.Cost = st.Cost.Add(amount)
		}
	}
	for _, c := range line.Cautions {
		if !r.cautions[c] {
			r.cautions[c] = true
			pf.Cautions = append(pf.Cautions, c)
		}
	}
}

// finish sorts the roll-up into the portfolio.
func (r *rollUp) finish(pf *Portfolio) {
	for _, c := range usage.WasteClasses {
		if ct := r.classes[c]; ct != nil {
			pf.Classes = append(pf.Classes, *ct)
		}
	}
	for _, ct := range r.codes {
		pf.Codes = append(pf.Codes, *ct)
	}
	sort.Slice(pf.Codes, func(i, j int) bool {
		if pf.Codes[i].Scheme != pf.Codes[j].Scheme {
			return pf.Codes[i].Scheme < pf.Codes[j].Scheme
		}
		return pf.Codes[i].Code < pf.Codes[j].Code
	})
	for _, st := range r.solvents {
		pf.Solvents = append(pf.Solvents, *st)
	}
	sort.Slice(pf.Solvents, func(i, j int) bool { return pf.Solvents[i].Solvent < pf.Solvents[j].Solvent })
	for q, v := range r.quarters {
		pf.Quarters = append(pf.Quarters, QuarterTotal{Quarter: q, Total: v})
	}
	sort.Slice(pf.Quarters, func(i, j int) bool {
		a, b := pf.Quarters[i].Quarter, pf.Quarters[j].Quarter
		if (a == "") != (b == "") {
			return b == ""
		}
		return a < b
	})
}

// rowCost is one method costed as a plan row's campaign.
type rowCost struct {
	j       int
	c       campaign.Cost
	oneTime decimal.Decimal // charged on this row
	total   decimal.Decimal
	perGram float64
}

// costRow runs one plan row as a campaign of its runs. charged records the
// scenario and method pairs whose one-time costs an earlier row bore.
func costRow(p *costing.Plan, row PlanRow, t *prices.Table, charged map[string]bool, runs runMemo) (PortfolioLine, error) {
	line := PortfolioLine{PlanRow: row, Title: p.Scenario.Name, Cautions: p.Cautions(), Quarter: Quarter(row.Date)}
	names := p.MethodNames()
	cands := make([]int, 0, len(names))
	if row.Method != "" {
		for k, name := range names {
			if name == row.Method {
				cands = append(cands, k)
			}
		}
		if len(cands) == 0 {
			return line, fmt.Errorf("method %q: write one of %s, or leave it empty to let sepcost choose", row.Method, strings.Join(names, ", "))
		}
		line.Forced = true
	} else {
		for k := range names {
			cands = append(cands, k)
		}
	}
	key := func(j int) string { return row.Scenario + "\x00" + names[j] }
	var best *rowCost
	var reasons []string
	for _, j := range cands {
		rc, reason, err := costMethod(p, j, row, t, row.Development == PerRow || (row.Development != Developed && !charged[key(j)]), runs)
		if err != nil {
			return line, err
		}
		if reason != "" {
			reasons = append(reasons, names[j]+": "+reason)
			continue
		}
		if best == nil || rc.perGram < best.perGram {
			best = rc
		}
	}
	if best == nil {
		if line.Forced {
			return line, fmt.Errorf("%s is not feasible for %s at %s: %s", row.Method, p.Scenario.Name, units.FormatMass(row.MassKg), strings.Join(reasons, "; "))
		}
		return line, fmt.Errorf("no method is feasible for %s at %s", p.Scenario.Name, units.FormatMass(row.MassKg))
	}
	res, err := runs.one(p, best.j, row.MassKg, t)
	if err != nil {
		return line, err
	}
	res.Ledger = best.c.Ledger
	if best.oneTime.IsPositive() {
		charged[key(best.j)] = true
	}
	line.Method = names[best.j]
	line.Result = res
	line.PerBatch, line.OneTime, line.Total = best.c.PerBatch, best.oneTime, best.total
	line.Waste = wasteRowsMemo(p, []float64{row.MassKg}, []string{line.Method}, [][]Result{{res}}, runs.classes(p))
	return line, nil
}

// costMethod costs method j as the row's campaign; bears says whether the
// row pays the method's one-time costs. A method that is not feasible
// gives its reason instead.
func costMethod(p *costing.Plan, j int, row PlanRow, t *prices.Table, bears bool, runs runMemo) (*rowCost, string, error) {
	t, err := p.SitePrices(t)
	if err != nil {
		return nil, "", err
	}
	r, err := runs.one(p, j, row.MassKg, t)
	if err != nil {
		return nil, "", err
	}
	u := r.Usage
	if !u.Feasible || u.ProductOutKg <= 0 {
		return nil, u.Reason, nil
	}
	c, err := campaign.RunWith(u, p.Pricer(t), max(row.Runs, 1), decimal.Zero, campaign.DefaultShifts)
	if err != nil {
		return nil, "", err
	}
	rc := &rowCost{j: j, c: c}
	if bears && row.Runs > 0 {
		rc.oneTime = c.OneTime
	}
	rc.total = c.PerBatch.Mul(decimal.NewFromInt(int64(row.Runs))).Add(rc.oneTime)
	// The choice is made on the campaign as charged; a row of no runs
	// chooses as one batch would.
	rc.perGram = rc.total.InexactFloat64() / (float64(row.Runs) * u.ProductOutKg * 1000)
	if row.Runs == 0 {
		rc.perGram = c.PerBatch.Add(c.OneTime).InexactFloat64() / (u.ProductOutKg * 1000)
	}
	return rc, "", nil
}

// runMemo holds the methods already run in one portfolio, by plan, method
// and batch mass: rows that repeat a scenario and mass (the same batch in
// several quarters, or with another number of runs) reuse the run. The
// models and the ledger are pure functions of those three and the price
// table, which is one per portfolio. Results are shared between rows and
// only read.
type runMemo struct {
	results map[runKey]costing.Result
	waste   map[*costing.Plan]map[string]waste.Classification // by classKey
}

func newRunMemo() runMemo {
	return runMemo{results: map[runKey]costing.Result{}, waste: map[*costing.Plan]map[string]waste.Classification{}}
}

// classes is the plan's waste classifications made so far.
func (m runMemo) classes(p *costing.Plan) map[string]waste.Classification {
	c, ok := m.waste[p]
	if !ok {
		c = map[string]waste.Classification{}
		m.waste[p] = c
	}
	return c
}

type runKey struct {
	p  *costing.Plan
	j  int
	kg float64
}

// one is p.RunOne(j, kg, t), run once per key.
func (m runMemo) one(p *costing.Plan, j int, kg float64, t *prices.Table) (costing.Result, error) {
	k := runKey{p, j, kg}
	if r, ok := m.results[k]; ok {
		return r, nil
	}
	r, err := p.RunOne(j, kg, t)
	if err == nil {
		m.results[k] = r
	}
	return r, err
}
