package scenario

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"reflect"
	"regexp"
	"sort"
	"strings"

	"go.yaml.in/yaml/v3"

	"sepcost/costing/quote"
)

// MaxFileSize caps a scenario file; real ones are a few kilobytes.
const MaxFileSize = 1 << 20

// UnmarshalYAML records the line of an unknown key.
func (a *rawAny) UnmarshalYAML(n *yaml.Node) error {
	a.Line = n.Line
	return nil
}

// Load reads and checks a scenario. file names the source in messages.
// The file holds one YAML document of at most MaxFileSize bytes.
func Load(r io.Reader, file string) (*Scenario, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxFileSize+1))
	if err != nil {
		return nil, &Problem{Of: ErrInvalid, File: file, Msg: "cannot read: " + err.Error()}
	}
	if len(data) > MaxFileSize {
		return nil, &Problem{Of: ErrInvalid, File: file, Msg: fmt.Sprintf("larger than %d bytes (1 MiB); a scenario is a short YAML file", MaxFileSize)}
	}
	dec := yaml.NewDecoder(bytes.NewReader(data))
	var doc yaml.Node
	if err := dec.Decode(&doc); err != nil && err != io.EOF {
		return nil, yamlProblem(file, err)
	}
	if len(doc.Content) == 0 {
		return nil, &Problem{Of: ErrInvalid, File: file, Msg: "empty; start from `sepcost init` for a commented example"}
	}
	var next yaml.Node
	if err := dec.Decode(&next); err != io.EOF {
		p := &Problem{Of: ErrInvalid, File: file, Msg: "holds more than one YAML document (a line `---` starts another); keep one scenario per file"}
		if err == nil {
			p.Line = next.Line
		}
		return nil, p
	}
	root := doc.Content[0]
	if root.Kind != yaml.MappingNode || !anyKnownKey(root) {
		return nil, &Problem{Of: ErrInvalid, File: file, Line: root.Line, Msg: fmt.Sprintf("does not look like a scenario: none of its top-level keys is a scenario field (%s); start from `sepcost init`",
			strings.Join(fieldNames(rawScenario{}), ", "))}
	}
	var raw rawScenario
	if err := root.Decode(&raw); err != nil {
		return nil, yamlProblem(file, err)
	}
	c := &collector{file: file, root: root}
	s := resolve(c, &raw, root)
	if err := c.err(); err != nil {
		return nil, err
	}
	return s, nil
}

// anyKnownKey reports whether a mapping has at least one scenario field.
func anyKnownKey(n *yaml.Node) bool {
	known := map[string]bool{}
	for _, f := range fieldNames(rawScenario{}) {
		known[f] = true
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		if known[n.Content[i].Value] {
			return true
		}
	}
	return false
}

var lineRe = regexp.MustCompile(`^line (\d+): (.*)$`)

// parserProblems are the YAML parser's (not scanner's) messages: the parser
// reports a 0-based line, so one is added to them.
var parserProblems = []string{
	"did not find expected ',' or ']'", "did not find expected ',' or '}'", "did not find expected '-' indicator",
	"did not find expected <document start>", "did not find expected <stream-start>", "did not find expected key",
	"did not find expected node content", "found duplicate %TAG directive", "found duplicate %YAML directive",
	"found incompatible YAML document", "found undefined tag handle",
}

// yamlProblem turns a YAML syntax or type error into Problems with lines.
func yamlProblem(file string, err error) error {
	var te *yaml.TypeError
	if errors.As(err, &te) {
		var ps Problems
		for _, e := range te.Errors {
			p := &Problem{Of: ErrInvalid, File: file, Msg: e}
			if m := lineRe.FindStringSubmatch(e); m != nil {
				fmt.Sscan(m[1], &p.Line)
				p.Msg = m[2]
			}
			p.Msg = plainTypeMessage(p.Msg)
			ps = append(ps, p)
		}
		return ps
	}
	msg := strings.TrimPrefix(err.Error(), "yaml: ")
	p := &Problem{Of: ErrInvalid, File: file, Line: 1, Msg: "not valid YAML: " + msg}
	if m := lineRe.FindStringSubmatch(msg); m != nil {
		fmt.Sscan(m[1], &p.Line)
		p.Msg = "not valid YAML: " + m[2]
		for _, pp := range parserProblems {
			if m[2] == pp {
				p.Line++
				break
			}
		}
	}
	return p
}

var typeRe = regexp.MustCompile("^cannot unmarshal (!!\\w+)(?: `(.*)`)? into (.*)$")

// plainTypeMessage rewrites the YAML library's "cannot unmarshal !!seq into
// string" in the words of the file: what was found and what belongs there.
func plainTypeMessage(msg string) string {
	m := typeRe.FindStringSubmatch(msg)
	if m == nil {
		return msg
	}
	found := map[string]string{"!!str": "text", "!!int": "a number", "!!float": "a number", "!!bool": "true or false",
		"!!seq": "a list", "!!map": "a section of keys and values", "!!null": "nothing", "!!timestamp": "a date"}[m[1]]
	if found == "" {
		found = "a value of type " + m[1]
	}
	if m[2] != "" {
		found += " (" + quote.Excerpt(m[2]) + ")"
	}
	want := "a single value"
	switch into := m[3]; {
	case strings.HasPrefix(into, "[]"):
		want = "a list"
	case strings.HasPrefix(into, "map["), strings.Contains(into, "."):
		want = "a section of keys and values"
	case into == "bool":
		want = "true or false"
	case strings.HasPrefix(into, "float"), strings.HasPrefix(into, "int"):
		want = "a number"
	}
	return fmt.Sprintf("%s is written where %s belongs (check the indentation and whether a list or a single value belongs here)", found, want)
}

// unknown reports keys that are not part of the schema, listing valid ones.
func (c *collector) unknown(extra map[string]rawAny, section string, of any) {
	if len(extra) == 0 {
		return
	}
	valid := fieldNames(of)
	keys := make([]string, 0, len(extra))
	for k := range extra {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		field := k
		if section != "" {
			field = section + "." + k
		}
		line := extra[k].Line
		if line == 0 {
			line = pathLine(c.root, field)
		}
		c.add(line, quote.Field(field), "not a known field; valid fields here: %s", strings.Join(valid, ", "))
	}
}

// fieldNames lists the YAML names of a schema struct's fields.
func fieldNames(v any) []string {
	t := reflect.TypeOf(v)
	for t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	var out []string
	for i := 0; i < t.NumField(); i++ {
		tag := strings.Split(t.Field(i).Tag.Get("yaml"), ",")[0]
		if tag != "" && tag != "-" {
			out = append(out, tag)
		}
	}
	return out
}

// keyLine finds the line of a key path in the document, or 0.
func keyLine(n *yaml.Node, path ...string) int {
	line := n.Line
	for _, key := range path {
		if n.Kind != yaml.MappingNode {
			return line
		}
		found := false
		for i := 0; i+1 < len(n.Content); i += 2 {
			if n.Content[i].Value == key {
				line = n.Content[i].Line
				n = n.Content[i+1]
				found = true
				break
			}
		}
		if !found {
			return line
		}
	}
	return line
}

var indexRe = regexp.MustCompile(`^(.*)\[(\d+)\]$`)

// pathLine finds the line of a field path such as "solvents[1].name" or
// "crystallization.second_crop.speed" in the document, or 0.
func pathLine(n *yaml.Node, path string) int {
	if n == nil {
		return 0
	}
	line := 0
	for _, part := range strings.Split(path, ".") {
		idx := -1
		if m := indexRe.FindStringSubmatch(part); m != nil {
			part = m[1]
			fmt.Sscan(m[2], &idx)
		}
		if n.Kind != yaml.MappingNode {
			return line
		}
		found := false
		for i := 0; i+1 < len(n.Content); i += 2 {
			if n.Content[i].Value == part {
				line, n, found = n.Content[i].Line, n.Content[i+1], true
				break
			}
		}
		if !found {
			return line
		}
		if idx >= 0 {
			if n.Kind != yaml.SequenceNode || idx >= len(n.Content) {
				return line
			}
			n = n.Content[idx]
			line = n.Line
		}
	}
	return line
}
