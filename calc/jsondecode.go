package calc

import (
	"bytes"
	"strconv"
	"unicode/utf8"

	"go.yaml.in/yaml/v3"
)

// jsonTree reads a calc file written as one JSON object into the node
// tree the YAML parser would build for it (JSON is a subset of YAML), at a
// fraction of the YAML parser's cost. The decoder then walks that tree
// exactly as it walks a YAML document, so unknown keys, duplicate keys,
// wrong types and their lines give the same problems on either path.
//
// It reads a strict subset only: one object, spaces and line breaks
// between tokens, strings whose characters and escapes the YAML parser
// accepts in a double-quoted scalar, and keys of at most 1024 bytes on one
// line with their colon (a YAML implicit key). For anything else it
// returns ok = false and Decode falls back to the YAML parser, which gives
// the message: invalid JSON, a tab between tokens, the escape \/ (valid
// JSON, refused by YAML), a surrogate escape, characters YAML refuses.
func jsonTree(data []byte) (root *yaml.Node, ok bool) {
	p := jsonParser{data: data, line: 1}
	// One slab for the nodes of the mappings: a key and a value per
	// colon; the elements of lists take further small slabs as needed.
	p.nodes = make([]yaml.Node, 1+2*bytes.Count(data, []byte{':'}))
	p.space()
	if p.i >= len(p.data) || p.data[p.i] != '{' {
		return nil, false
	}
	root = p.value(0)
	if p.bad {
		return nil, false
	}
	p.space()
	if p.bad || p.i != len(p.data) {
		return nil, false
	}
	return root, true
}

type jsonParser struct {
	data []byte
	i    int
	line int
	bad  bool
	// nodes is a slab the nodes are cut from: one allocation for many.
	nodes []yaml.Node
	buf   []byte
	// stack holds the children of the open collections; each collection
	// takes an exact copy of its own when it closes.
	stack []*yaml.Node
}

// close gives n the children pushed since mark.
func (p *jsonParser) close(n *yaml.Node, mark int) {
	n.Content = append(make([]*yaml.Node, 0, len(p.stack)-mark), p.stack[mark:]...)
	p.stack = p.stack[:mark]
}

func (p *jsonParser) node(kind yaml.Kind, tag string, line int) *yaml.Node {
	if len(p.nodes) == 0 {
		p.nodes = make([]yaml.Node, 16)
	}
	n := &p.nodes[0]
	p.nodes = p.nodes[1:]
	n.Kind, n.Tag, n.Line = kind, tag, line
	return n
}

// space skips spaces and line breaks, counting lines as YAML does (CR LF,
// LF and a lone CR each end a line). A tab is left to the YAML parser.
func (p *jsonParser) space() {
	for p.i < len(p.data) {
		switch p.data[p.i] {
		case ' ':
		case '\n':
			p.line++
		case '\r':
			if p.i+1 >= len(p.data) || p.data[p.i+1] != '\n' {
				p.line++
			}
		default:
			return
		}
		p.i++
	}
}

func (p *jsonParser) value(depth int) *yaml.Node {
	if p.bad || p.i >= len(p.data) || depth > maxDepth {
		p.bad = true
		return nil
	}
	line := p.line
	switch c := p.data[p.i]; {
	case c == '{':
		p.i++
		n := p.node(yaml.MappingNode, "!!map", line)
		n.Style = yaml.FlowStyle
		p.space()
		if p.i < len(p.data) && p.data[p.i] == '}' {
			p.i++
			return n
		}
		mark := len(p.stack)
		for !p.bad {
			p.space()
			if p.i >= len(p.data) || p.data[p.i] != '"' {
				p.bad = true
				return nil
			}
			start := p.i
			k := p.str()
			if p.bad || p.i-start > 1024 {
				p.bad = true
				return nil
			}
			kl := p.line
			p.space()
			if p.line != kl || p.i >= len(p.data) || p.data[p.i] != ':' {
				p.bad = true
				return nil
			}
			p.i++
			p.space()
			v := p.value(depth + 1)
			p.stack = append(p.stack, k, v)
			p.space()
			if p.i >= len(p.data) {
				p.bad = true
				return nil
			}
			switch p.data[p.i] {
			case ',':
				p.i++
			case '}':
				p.i++
				p.close(n, mark)
				return n
			default:
				p.bad = true
				return nil
			}
		}
		return nil
	case c == '[':
		p.i++
		n := p.node(yaml.SequenceNode, "!!seq", line)
		n.Style = yaml.FlowStyle
		p.space()
		if p.i < len(p.data) && p.data[p.i] == ']' {
			p.i++
			return n
		}
		mark := len(p.stack)
		for !p.bad {
			p.space()
			p.stack = append(p.stack, p.value(depth+1))
			p.space()
			if p.i >= len(p.data) {
				p.bad = true
				return nil
			}
			switch p.data[p.i] {
			case ',':
				p.i++
			case ']':
				p.i++
				p.close(n, mark)
				return n
			default:
				p.bad = true
				return nil
			}
		}
		return nil
	case c == '"':
		return p.str()
	case c == '-' || (c >= '0' && c <= '9'):
		return p.number()
	default:
		for _, w := range [...]struct{ word, tag string }{{"true", "!!bool"}, {"false", "!!bool"}, {"null", "!!null"}} {
			if len(p.data)-p.i >= len(w.word) && string(p.data[p.i:p.i+len(w.word)]) == w.word {
				p.i += len(w.word)
				if p.i < len(p.data) && !isDelim(p.data[p.i]) {
					break
				}
				n := p.node(yaml.ScalarNode, w.tag, line)
				n.Value = w.word
				return n
			}
		}
		p.bad = true
		return nil
	}
}

// isDelim reports whether c may follow a scalar in JSON.
func isDelim(c byte) bool {
	return c == ',' || c == '}' || c == ']' || c == ' ' || c == '\n' || c == '\r'
}

// number reads a JSON number; its node holds the text as written, as the
// YAML parser's plain scalar does.
func (p *jsonParser) number() *yaml.Node {
	start, d := p.i, p.data
	digits := func() int {
		n := 0
		for p.i < len(d) && d[p.i] >= '0' && d[p.i] <= '9' {
			p.i++
			n++
		}
		return n
	}
	if d[p.i] == '-' {
		p.i++
	}
	if p.i < len(d) && d[p.i] == '0' {
		p.i++
	} else if digits() == 0 {
		p.bad = true
		return nil
	}
	tag := "!!int"
	if p.i < len(d) && d[p.i] == '.' {
		p.i++
		tag = "!!float"
		if digits() == 0 {
			p.bad = true
			return nil
		}
	}
	if p.i < len(d) && (d[p.i] == 'e' || d[p.i] == 'E') {
		p.i++
		tag = "!!float"
		if p.i < len(d) && (d[p.i] == '+' || d[p.i] == '-') {
			p.i++
		}
		if digits() == 0 {
			p.bad = true
			return nil
		}
	}
	if p.i < len(d) && !isDelim(d[p.i]) {
		p.bad = true
		return nil
	}
	n := p.node(yaml.ScalarNode, tag, p.line)
	n.Value = string(d[start:p.i])
	return n
}

// str reads a JSON string into a double-quoted scalar node.
func (p *jsonParser) str() *yaml.Node {
	d := p.data
	line := p.line
	p.i++ // the opening quote
	start := p.i
	// The common case: no escapes, printable ASCII only.
	for p.i < len(d) && d[p.i] >= 0x20 && d[p.i] < 0x7f && d[p.i] != '"' && d[p.i] != '\\' {
		p.i++
	}
	if p.i < len(d) && d[p.i] == '"' {
		n := p.node(yaml.ScalarNode, "!!str", line)
		n.Style = yaml.DoubleQuotedStyle
		n.Value = string(d[start:p.i])
		p.i++
		return n
	}
	b := append(p.buf[:0], d[start:p.i]...)
	for {
		if p.i >= len(d) {
			p.bad = true
			return nil
		}
		c := d[p.i]
		switch {
		case c == '"':
			p.i++
			p.buf = b
			n := p.node(yaml.ScalarNode, "!!str", line)
			n.Style = yaml.DoubleQuotedStyle
			n.Value = string(b)
			return n
		case c == '\\':
			if p.i+1 >= len(d) {
				p.bad = true
				return nil
			}
			e := d[p.i+1]
			p.i += 2
			switch e {
			case '"', '\\':
				b = append(b, e)
			case 'b':
				b = append(b, '\b')
			case 'f':
				b = append(b, '\f')
			case 'n':
				b = append(b, '\n')
			case 'r':
				b = append(b, '\r')
			case 't':
				b = append(b, '\t')
			case 'u':
				if p.i+4 > len(d) {
					p.bad = true
					return nil
				}
				v, err := strconv.ParseUint(string(d[p.i:p.i+4]), 16, 32)
				if err != nil || (v >= 0xD800 && v <= 0xDFFF) {
					// A surrogate escape: YAML refuses it, JSON pairs it.
					p.bad = true
					return nil
				}
				b = utf8.AppendRune(b, rune(v))
				p.i += 4
			default:
				// \/ among them: valid JSON, refused by YAML.
				p.bad = true
				return nil
			}
		case c < 0x80:
			if c < 0x20 || c == 0x7f {
				p.bad = true
				return nil
			}
			b = append(b, c)
			p.i++
		default:
			r, size := utf8.DecodeRune(d[p.i:])
			if !yamlPrintable(r, size) {
				p.bad = true
				return nil
			}
			b = append(b, d[p.i:p.i+size]...)
			p.i += size
		}
	}
}

// yamlPrintable reports whether the YAML reader accepts a multi-byte
// character r encoded in size bytes.
func yamlPrintable(r rune, size int) bool {
	if r == utf8.RuneError && size <= 1 {
		return false // not UTF-8
	}
	return r == 0x85 || (r >= 0xA0 && r <= 0xD7FF) || (r >= 0xE000 && r <= 0xFFFD) || (r >= 0x10000 && r <= 0x10FFFF)
}
