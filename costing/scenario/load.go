package scenario

import (
	"errors"
	"fmt"
	"io"
	"reflect"
	"regexp"
	"sort"
	"strings"

	"go.yaml.in/yaml/v3"
)

// MaxFileSize caps a scenario file; real ones are a few kilobytes.
const MaxFileSize = 1 << 20

// UnmarshalYAML records the line of an unknown key.
func (a *rawAny) UnmarshalYAML(n *yaml.Node) error {
	a.Line = n.Line
	return nil
}

// Load reads and checks a scenario. file names the source in messages.
func Load(r io.Reader, file string) (*Scenario, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxFileSize+1))
	if err != nil {
		return nil, &Problem{File: file, Msg: "cannot read: " + err.Error()}
	}
	if len(data) > MaxFileSize {
		return nil, &Problem{File: file, Msg: fmt.Sprintf("larger than %d bytes; a scenario is a short YAML file", MaxFileSize)}
	}
	var doc yaml.Node
	if err := yaml.Unmarshal(data, &doc); err != nil {
		return nil, yamlProblem(file, err)
	}
	if len(doc.Content) == 0 {
		return nil, &Problem{File: file, Msg: "empty; start from `sepcost init` for a commented example"}
	}
	var raw rawScenario
	if err := doc.Content[0].Decode(&raw); err != nil {
		return nil, yamlProblem(file, err)
	}
	c := &collector{file: file}
	s := resolve(c, &raw, doc.Content[0])
	if err := c.err(); err != nil {
		return nil, err
	}
	return s, nil
}

var lineRe = regexp.MustCompile(`^line (\d+): (.*)$`)

// yamlProblem turns a YAML syntax or type error into Problems with lines.
func yamlProblem(file string, err error) error {
	var te *yaml.TypeError
	if errors.As(err, &te) {
		var ps Problems
		for _, e := range te.Errors {
			p := &Problem{File: file, Msg: e}
			if m := lineRe.FindStringSubmatch(e); m != nil {
				fmt.Sscan(m[1], &p.Line)
				p.Msg = m[2]
			}
			if strings.Contains(p.Msg, "cannot unmarshal") {
				p.Msg += " (check the indentation and whether a list or a single value belongs here)"
			}
			ps = append(ps, p)
		}
		return ps
	}
	msg := strings.TrimPrefix(err.Error(), "yaml: ")
	p := &Problem{File: file, Msg: "not valid YAML: " + msg}
	if m := lineRe.FindStringSubmatch(msg); m != nil {
		fmt.Sscan(m[1], &p.Line)
		p.Msg = "not valid YAML: " + m[2]
	}
	return p
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
		c.add(extra[k].Line, field, "not a known field; valid fields here: %s", strings.Join(valid, ", "))
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
