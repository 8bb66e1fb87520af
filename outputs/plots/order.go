package plots

import "sort"

// keysByValue returns m's keys ordered by value, ties by key.
func keysByValue(m map[string]int) []string {
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Slice(keys, func(i, j int) bool {
		if m[keys[i]] != m[keys[j]] {
			return m[keys[i]] < m[keys[j]]
		}
		return keys[i] < keys[j]
	})
	return keys
}

// sortedKeys returns the keys of a set of values, ascending.
func sortedKeys(set map[float64]bool) []float64 {
	out := make([]float64, 0, len(set))
	for x := range set {
		out = append(out, x)
	}
	sort.Float64s(out)
	return out
}
