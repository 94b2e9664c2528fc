// Package templates holds the starter scenario and price table. The
// starter scenario is also the demo scenario, and the starter prices are
// the demo's example prices: both say so at their top.
package templates

import _ "embed"

// Scenario is the starter (and demo) scenario, a commented YAML file.
//
//go:embed scenario.yaml
var Scenario []byte

// Prices is the starter (and demo) price table, CSV with example prices.
//
//go:embed prices.csv
var Prices []byte

// Equipment is the starter (and built-in default) site equipment table,
// CSV with example sizes, rates and prices.
//
//go:embed equipment.csv
var Equipment []byte

// Liquid is a second demo scenario: a liquid product that can be distilled.
//
//go:embed liquid.yaml
var Liquid []byte

// File names written by `sepcost init`.
const (
	ScenarioName  = "scenario.yaml"
	PricesName    = "prices.csv"
	EquipmentName = "equipment.csv"
)
