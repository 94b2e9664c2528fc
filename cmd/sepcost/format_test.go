package main

import "testing"

// Every output format has a renderer for every kind of output, and its
// file extension maps back to it (.xlsx: ISO/IEC 29500 Office Open XML;
// .json: RFC 8259; .csv: RFC 4180; .txt plain text — common practice).
func TestFormatTables(t *testing.T) {
	t.Parallel()
	for _, e := range formats {
		if _, ok := reportRenderers[e.f]; !ok {
			t.Errorf("no report renderer for %s", e.f)
		}
		if _, ok := wasteRenderers[e.f]; !ok {
			t.Errorf("no waste renderer for %s", e.f)
		}
		if _, ok := portfolioRenderers[e.f]; !ok {
			t.Errorf("no portfolio renderer for %s", e.f)
		}
		if f, ok := formatOfExt(e.ext); !ok || f != e.f || e.f.ext() != e.ext {
			t.Errorf("%s: extension %s maps to %q", e.f, e.ext, f)
		}
	}
	if len(reportRenderers) != len(formats) || len(wasteRenderers) != len(formats) || len(portfolioRenderers) != len(formats) {
		t.Error("a renderer table holds a format the format list does not")
	}
}
