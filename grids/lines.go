package grids

import (
	"strconv"
	"strings"
)

// keyLines maps each dotted key path of a TOML document to the 1-based line
// where it is written, so that problems found after decoding can name their
// line. Tables of an array get an index ("wind.site[1]"); keys inside an
// inline table get the line of the key that opens it. It reads only the
// shapes grid files use and ignores what it does not understand: a missing
// entry only costs a problem its line number.
func keyLines(data []byte) map[string]int {
	lines := map[string]int{}
	arrayCount := map[string]int{}
	prefix := ""
	depth := 0 // open brackets and braces carried over from earlier lines
	for i, raw := range strings.Split(string(data), "\n") {
		n := i + 1
		line := stripComment(raw)
		if depth > 0 {
			depth += bracketDepth(line)
			continue
		}
		t := strings.TrimSpace(line)
		switch {
		case t == "":
		case strings.HasPrefix(t, "[["):
			name := normaliseKey(strings.TrimSuffix(strings.TrimPrefix(t, "[["), "]]"))
			prefix = name + "[" + strconv.Itoa(arrayCount[name]) + "]"
			arrayCount[name]++
			setLine(lines, prefix, n)
		case strings.HasPrefix(t, "["):
			prefix = normaliseKey(strings.TrimSuffix(strings.TrimPrefix(t, "["), "]"))
			setLine(lines, prefix, n)
		default:
			eq := strings.Index(t, "=")
			if eq < 0 {
				continue
			}
			key := joinKey(prefix, normaliseKey(t[:eq]))
			setLine(lines, key, n)
			value := t[eq+1:]
			inlineKeys(lines, key, value, n)
			depth = bracketDepth(value)
		}
	}
	return lines
}

func setLine(lines map[string]int, key string, n int) {
	if _, ok := lines[key]; !ok {
		lines[key] = n
	}
}

// inlineKeys records the keys of a one-line inline table, e.g. span_m = {from = 6, ...}.
func inlineKeys(lines map[string]int, key, value string, n int) {
	v := strings.TrimSpace(value)
	if !strings.HasPrefix(v, "{") {
		return
	}
	for _, part := range strings.Split(strings.Trim(v, "{} "), ",") {
		if eq := strings.Index(part, "="); eq >= 0 {
			setLine(lines, joinKey(key, normaliseKey(part[:eq])), n)
		}
	}
}

func joinKey(prefix, key string) string {
	if prefix == "" {
		return key
	}
	return prefix + "." + key
}

// normaliseKey removes spaces and quotes around the parts of a dotted key.
func normaliseKey(k string) string {
	parts := strings.Split(k, ".")
	for i, p := range parts {
		parts[i] = strings.Trim(strings.TrimSpace(p), `"'`)
	}
	return strings.Join(parts, ".")
}

// stripComment drops a # comment that is not inside a string.
func stripComment(s string) string {
	var quote rune
	for i, r := range s {
		switch {
		case quote != 0:
			if r == quote {
				quote = 0
			}
		case r == '"' || r == '\'':
			quote = r
		case r == '#':
			return s[:i]
		}
	}
	return s
}

// bracketDepth counts opening minus closing brackets and braces outside strings.
func bracketDepth(s string) int {
	d := 0
	var quote rune
	for _, r := range s {
		switch {
		case quote != 0:
			if r == quote {
				quote = 0
			}
		case r == '"' || r == '\'':
			quote = r
		case r == '[' || r == '{':
			d++
		case r == ']' || r == '}':
			d--
		}
	}
	return d
}
