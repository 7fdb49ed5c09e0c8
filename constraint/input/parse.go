package input

import (
	"fmt"
	"path/filepath"
	"strings"
)

// Format is a file format.
type Format uint8

// The formats.
const (
	YAML Format = iota
	TOML
	JSON
)

func (f Format) String() string {
	switch f {
	case TOML:
		return "TOML"
	case JSON:
		return "JSON"
	}
	return "YAML"
}

// FormatOf gives the format a file name's extension says: ".toml" is TOML,
// ".json" and ".jsonl" JSON, anything else YAML.
func FormatOf(name string) Format {
	switch ext := strings.ToLower(filepath.Ext(name)); ext {
	case ".toml":
		return TOML
	case ".json", ".jsonl":
		return JSON
	}
	return YAML
}

// ParseFormat reads a format's name: "yaml", "toml" or "json" (any case).
func ParseFormat(s string) (Format, error) {
	switch strings.ToLower(s) {
	case "yaml", "yml", "":
		return YAML, nil
	case "toml":
		return TOML, nil
	case "json":
		return JSON, nil
	}
	return 0, fmt.Errorf("unknown format %q: expected yaml, toml or json", s)
}

// Parse checks data against the limits and the rules every format shares
// ([Check]) and reads it as one document of the format. Empty input is an
// error.
func Parse(name string, data []byte, format Format, l Limits) (*Node, error) {
	data, err := Check(name, data, format, l)
	if err != nil {
		return nil, err
	}
	var root *Node
	switch format {
	case TOML:
		root, err = parseTOML(name, data)
	case JSON:
		root, err = parseJSON(name, data, l.maxDepth())
	default:
		root, err = parseYAML(name, data)
	}
	if err != nil {
		return nil, err
	}
	if root == nil {
		return nil, &Error{File: name, Msg: "the file is empty"}
	}
	return root, nil
}
