package workbook

import (
	"bytes"
	"regexp"
	"testing"
)

// uprightTitlesByPattern is uprightTitles written with the regular
// expression its doc comment names: the oracle for the plain searches.
func uprightTitlesByPattern(b []byte, p string) []byte {
	title := regexp.MustCompile(`(?s)<` + regexp.QuoteMeta(p) + `title>.*?</` + regexp.QuoteMeta(p) + `title>`)
	flat := []byte("<" + p + `txPr><a:bodyPr anchorCtr="false" rot="0"`)
	upright := []byte("<" + p + `txPr><a:bodyPr anchorCtr="false" rot="-5400000" vert="horz"`)
	return title.ReplaceAllFunc(b, func(t []byte) []byte {
		if !bytes.Contains(t, []byte(`rot="-5400000"`)) {
			return t
		}
		return bytes.Replace(t, flat, upright, 1)
	})
}

// uprightTitles gives what the pattern (?s)<title>.*?</title> and a
// replacement inside each match give, on every chart part of the demo
// workbook and on made-up parts: titles with and without the rotation,
// nested and unclosed openings, a namespace prefix, line breaks.
func TestUprightTitlesAsPattern(t *testing.T) {
	t.Parallel()
	const rot = `<title><tx><rich><a:bodyPr rot="-5400000"/></rich></tx><txPr><a:bodyPr anchorCtr="false" rot="0" x="1"/></txPr></title>`
	cases := []struct{ in, p string }{
		{"", ""}, {"no titles here", ""}, {rot, ""}, {rot + "middle" + rot, ""},
		{`<title>plain <txPr><a:bodyPr anchorCtr="false" rot="0"</title>`, ""},
		{`<title>a<title>b rot="-5400000" <txPr><a:bodyPr anchorCtr="false" rot="0"</title>`, ""},
		{`<title>never closed rot="-5400000"`, ""}, {"</title><title>\n" + rot[7:], ""},
		{`<c:title>rot="-5400000"` + "\n" + `<c:txPr><a:bodyPr anchorCtr="false" rot="0"/></c:title><title>x</title>`, "c:"},
	}
	var buf bytes.Buffer
	if err := Write(&buf, demoReport(t), Options{}); err != nil {
		t.Fatal(err)
	}
	parts := packageParts(t, buf.Bytes())
	for name, b := range parts {
		if bytes.HasPrefix([]byte(name), []byte("xl/charts/")) {
			cases = append(cases, struct{ in, p string }{string(b), ""})
		}
	}
	for _, c := range cases {
		got, want := uprightTitles([]byte(c.in), c.p), uprightTitlesByPattern([]byte(c.in), c.p)
		if !bytes.Equal(got, want) {
			t.Errorf("uprightTitles(%.80q, %q) = %.200q, the pattern gives %.200q", c.in, c.p, got, want)
		}
	}
}
