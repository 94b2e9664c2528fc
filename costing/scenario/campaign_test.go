package scenario

import (
	"strings"
	"testing"
)

func TestLoadCampaign(t *testing.T) {
	t.Parallel()
	s, err := Load(strings.NewReader(good+`campaign:
  product: "5 kg"
  batch_mass: "500 g"
  shift_length: "7.5 h"
  shifts_per_day: 2
`), "c.yaml")
	if err != nil {
		t.Fatal(err)
	}
	c := s.Campaign
	// 7.5 h = 27000 s (1 h = 3600 s, SI Brochure, 9th ed., 2019; from memory).
	if c == nil || c.ProductKg != 5 || c.Batches != 0 || c.BatchKg != 0.5 || c.ShiftS != 27000 || c.ShiftsPerDay != 2 {
		t.Fatalf("campaign %+v", c)
	}
	// Batches given, batch mass defaulting to the target mass (2 kg, the largest).
	s, err = Load(strings.NewReader(good+"campaign:\n  batches: 12\n"), "c.yaml")
	if err != nil {
		t.Fatal(err)
	}
	if c := s.Campaign; c.Batches != 12 || c.BatchKg != 2 || c.ShiftS != DefaultShiftS || c.ShiftsPerDay != 1 {
		t.Errorf("defaults %+v", c)
	}
}

func TestLoadCampaignBad(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name, yaml string
		want       []string
	}{
		{"both", "campaign:\n  product: \"5 kg\"\n  batches: 3\n", []string{"campaign.batches", "not both"}},
		{"neither", "campaign:\n  shifts_per_day: 1\n", []string{"campaign:", "write product"}},
		{"bare product", "campaign:\n  product: 5\n", []string{"campaign.product", "has no unit"}},
		{"zero batches", "campaign:\n  batches: 0\n", []string{"campaign.batches", "from 1 to"}},
		{"fractional batches", "campaign:\n  batches: 2.5\n", []string{"campaign.batches", "whole number"}},
		{"long shift", "campaign:\n  batches: 2\n  shift_length: \"30 h\"\n", []string{"campaign.shift_length", "at most 24 h"}},
		{"four shifts", "campaign:\n  batches: 2\n  shifts_per_day: 4\n", []string{"campaign.shifts_per_day", "1, 2 or 3"}},
		{"too many hours", "campaign:\n  batches: 2\n  shift_length: \"12 h\"\n  shifts_per_day: 3\n", []string{"exceed 24 h"}},
		{"unknown", "campaign:\n  batches: 2\n  weeks: 3\n", []string{"weeks"}},
		{"negative batch mass", "campaign:\n  batches: 2\n  batch_mass: \"-1 kg\"\n", []string{"campaign.batch_mass", "above zero"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			expectProblems(t, good+c.yaml, "c.yaml", append(c.want, "c.yaml:"))
		})
	}
}
