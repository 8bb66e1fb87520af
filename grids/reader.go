package grids

import (
	"fmt"
	"maps"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"
)

// maxValues caps the values of one dimension, so that a range with a tiny
// step is a problem rather than an exhausted memory.
const maxValues = 10000

// reader walks a decoded TOML document, collecting every problem it finds.
type reader struct {
	file     string
	lines    map[string]int
	problems []Problem
}

// line returns the line of key, or of its nearest parent written in the file.
func (r *reader) line(key string) int {
	for k := key; k != ""; {
		if n, ok := r.lines[k]; ok {
			return n
		}
		i := strings.LastIndexAny(k, ".[")
		if i < 0 {
			break
		}
		k = k[:i]
	}
	return 0
}

func (r *reader) add(key string, value any, allowed string) {
	v := ""
	if value != nil {
		v = formatValue(value)
	}
	r.problems = append(r.problems, Problem{File: r.file, Line: r.line(key), Key: key, Value: v, Allowed: allowed})
}

func (r *reader) missing(key string) {
	s := specFor(key)
	r.problems = append(r.problems, Problem{File: r.file, Line: r.line(key), Key: key,
		Allowed: "missing; " + s.Default + " (" + s.Type + ", allowed " + s.allowed() + ")"})
}

// sorted returns the problems in file order; missing keys without a line last.
func (r *reader) sorted() []Problem {
	ps := slices.Clone(r.problems)
	sort.SliceStable(ps, func(i, j int) bool {
		li, lj := ps[i].Line, ps[j].Line
		if li == 0 || lj == 0 {
			return lj == 0 && li != 0
		}
		return li < lj
	})
	return ps
}

// checkKeys reports every key of table m (at path) that the reference does not know.
func (r *reader) checkKeys(m map[string]any, path string) {
	known := knownChildren(path)
	for _, k := range slices.Sorted(maps.Keys(m)) {
		if !slices.Contains(known, k) {
			r.add(joinKey(path, k), m[k], "unknown key; allowed here: "+strings.Join(known, ", "))
		}
	}
}

// knownChildren lists the keys the reference allows directly under path.
func knownChildren(path string) []string {
	p := specPath(path)
	var out []string
	for _, s := range keySpecs {
		rest, ok := strings.CutPrefix(s.Key, p+".")
		if p == "" {
			rest, ok = s.Key, true
		}
		if !ok {
			continue
		}
		child, _, _ := strings.Cut(rest, ".")
		child = strings.TrimSuffix(child, "[]")
		if !slices.Contains(out, child) {
			out = append(out, child)
		}
	}
	return out
}

// table returns the sub-table m[name]; a value of another type is a problem.
func (r *reader) table(m map[string]any, path, name string) (map[string]any, bool) {
	v, ok := m[name]
	if !ok {
		return nil, false
	}
	t, ok := v.(map[string]any)
	if !ok {
		r.add(joinKey(path, name), v, "must be a table ["+joinKey(path, name)+"]")
		return nil, false
	}
	r.checkKeys(t, joinKey(path, name))
	return t, true
}

// toFloat accepts TOML integers and floats.
func toFloat(v any) (float64, bool) {
	switch x := v.(type) {
	case int64:
		return float64(x), true
	case float64:
		return x, !math.IsNaN(x) && !math.IsInf(x, 0)
	}
	return 0, false
}

// number reads a scalar number checked against the key's bounds.
func (r *reader) number(m map[string]any, path, name string, def float64, required bool) float64 {
	key := joinKey(path, name)
	v, ok := m[name]
	if !ok {
		if required {
			r.missing(key)
		}
		return def
	}
	x, ok := toFloat(v)
	if !ok {
		r.add(key, v, "must be a number; allowed "+specFor(key).allowed())
		return def
	}
	if b := specFor(key).Bounds; b != nil && !b.contains(x) {
		r.add(key, v, "allowed "+b.String())
	}
	return x
}

// integer reads a scalar integer that must be one of allowed.
func (r *reader) integer(m map[string]any, path, name string, def int, allowed []int) int {
	key := joinKey(path, name)
	v, ok := m[name]
	if !ok {
		return def
	}
	x, ok := v.(int64)
	if !ok || !slices.Contains(allowed, int(x)) {
		r.add(key, v, "allowed "+specFor(key).allowed())
		return def
	}
	return int(x)
}

// str reads a string that must be one of allowed (any string when allowed is nil).
func (r *reader) str(m map[string]any, path, name, def string, required bool, allowed []string) string {
	key := joinKey(path, name)
	v, ok := m[name]
	if !ok {
		if required {
			r.missing(key)
		}
		return def
	}
	s, ok := v.(string)
	if !ok {
		r.add(key, v, "must be a string; allowed "+specFor(key).allowed())
		return def
	}
	if allowed != nil && !slices.Contains(allowed, s) {
		r.add(key, v, "allowed "+specFor(key).allowed())
		return def
	}
	return s
}

// boolean reads true or false.
func (r *reader) boolean(m map[string]any, path, name string, def bool) bool {
	v, ok := m[name]
	if !ok {
		return def
	}
	b, ok := v.(bool)
	if !ok {
		r.add(joinKey(path, name), v, "must be true or false")
		return def
	}
	return b
}

// strs reads a non-empty list of distinct strings, each one of allowed.
func (r *reader) strs(m map[string]any, path, name string, def, allowed []string) []string {
	key := joinKey(path, name)
	v, ok := m[name]
	if !ok {
		return def
	}
	list, ok := v.([]any)
	if !ok {
		r.add(key, v, "must be a list of strings; allowed "+specFor(key).allowed())
		return def
	}
	if len(list) == 0 {
		r.add(key, v, "must not be empty; allowed "+specFor(key).allowed())
	}
	var out []string
	for _, e := range list {
		s, ok := e.(string)
		switch {
		case !ok || !slices.Contains(allowed, s):
			r.add(key, e, "allowed "+specFor(key).allowed())
		case slices.Contains(out, s):
			r.add(key, e, "duplicate value; give each value once")
		default:
			out = append(out, s)
		}
	}
	return out
}

// numbers reads a dimension: a non-empty list of distinct numbers or a
// {from, to, step} range, each value within the key's bounds.
func (r *reader) numbers(m map[string]any, path, name string) ([]float64, bool) {
	key := joinKey(path, name)
	v, ok := m[name]
	if !ok {
		return nil, false
	}
	var vals []float64
	switch x := v.(type) {
	case []any:
		if len(x) == 0 {
			r.add(key, v, "must not be empty; give a list or {from, to, step}")
		}
		if len(x) > maxValues {
			r.add(key, nil, fmt.Sprintf("%d values; at most %d allowed", len(x), maxValues))
			return nil, true
		}
		for _, e := range x {
			f, ok := toFloat(e)
			if !ok {
				r.add(key, e, "must be a number; allowed "+specFor(key).allowed())
				continue
			}
			vals = append(vals, f)
		}
	case map[string]any:
		vals = r.rangeValues(x, key)
	default:
		r.add(key, v, "must be a list of numbers or {from, to, step}")
		return nil, true
	}
	return r.checkValues(key, vals), true
}

// rangeValues expands {from, to, step}.
func (r *reader) rangeValues(m map[string]any, key string) []float64 {
	for _, k := range slices.Sorted(maps.Keys(m)) {
		if k != "from" && k != "to" && k != "step" {
			r.add(key+"."+k, m[k], "unknown key; allowed here: from, to, step")
		}
	}
	var f [3]float64
	okAll := true
	for i, k := range []string{"from", "to", "step"} {
		v, ok := m[k]
		if !ok {
			r.add(key+"."+k, nil, "missing; a range needs from, to and step")
			okAll = false
			continue
		}
		if f[i], ok = toFloat(v); !ok {
			r.add(key+"."+k, v, "must be a number")
			okAll = false
		}
	}
	if !okAll {
		return nil
	}
	from, to, step := f[0], f[1], f[2]
	switch {
	case step <= 0:
		r.add(key+".step", m["step"], "allowed step > 0")
		return nil
	case from > to:
		r.add(key+".from", m["from"], "allowed from ≤ to (to = "+fmtNum(to)+")")
		return nil
	}
	n := math.Round((to - from) / step)
	if n >= maxValues {
		r.add(key+".step", m["step"], fmt.Sprintf("gives more than %d values; allowed a larger step", maxValues))
		return nil
	}
	if math.Abs(from+n*step-to) > 1e-6*math.Max(1, math.Abs(to)) {
		r.add(key+".to", m["to"], "must fall on a step: from + n × step (from = "+fmtNum(from)+", step = "+fmtNum(step)+")")
		return nil
	}
	vals := make([]float64, 0, int(n)+1)
	for i := 0; i <= int(n); i++ {
		vals = append(vals, round6(from+float64(i)*step))
	}
	return vals
}

// checkValues reports values outside the key's bounds and duplicates, and
// returns the good values.
func (r *reader) checkValues(key string, vals []float64) []float64 {
	b := specFor(key).Bounds
	var out []float64
	for _, v := range vals {
		switch {
		case b != nil && !b.contains(v):
			r.add(key, v, "allowed "+b.String())
		case slices.Contains(out, v):
			r.add(key, v, "duplicate value; give each value once")
		default:
			out = append(out, v)
		}
	}
	return out
}

// ints reads a dimension of whole numbers (a list or a range).
func (r *reader) ints(m map[string]any, path, name string) ([]int, bool) {
	vals, ok := r.numbers(m, path, name)
	var out []int
	for _, v := range vals {
		if v != math.Trunc(v) {
			r.add(joinKey(path, name), v, "must be a whole number")
			continue
		}
		out = append(out, int(v))
	}
	return out, ok
}

// round6 removes the floating-point drift of a stepped range.
func round6(v float64) float64 { return math.Round(v*1e6) / 1e6 }

// formatValue writes a decoded TOML value back in TOML syntax.
func formatValue(v any) string {
	switch x := v.(type) {
	case string:
		return strconv.Quote(x)
	case float64:
		return fmtNum(x)
	case []any:
		parts := make([]string, len(x))
		for i, e := range x {
			parts[i] = formatValue(e)
		}
		return "[" + strings.Join(parts, ", ") + "]"
	case []map[string]any:
		parts := make([]string, len(x))
		for i, e := range x {
			parts[i] = formatValue(e)
		}
		return "[" + strings.Join(parts, ", ") + "]"
	case map[string]any:
		keys := slices.Sorted(maps.Keys(x))
		parts := make([]string, len(keys))
		for i, k := range keys {
			parts[i] = k + " = " + formatValue(x[k])
		}
		return "{" + strings.Join(parts, ", ") + "}"
	}
	return fmt.Sprint(v)
}
