package report

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// num formats v with prec decimals, never as "-0".
func num(v float64, prec int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return "—"
	}
	s := strconv.FormatFloat(v, 'f', prec, 64)
	if strings.Trim(s, "-0.") == "" {
		return strconv.FormatFloat(0, 'f', prec, 64)
	}
	return s
}

// signed formats v with an explicit sign, for pressure coefficients and
// pressures (inward positive).
func signed(v float64, prec int) string {
	s := num(v, prec)
	if !strings.HasPrefix(s, "-") {
		return "+" + s
	}
	return s
}

// short formats v with up to 4 significant digits and no trailing zeros,
// for inputs such as spans and factors.
func short(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }

// util formats a utilisation (demand over capacity).
func util(v float64) string { return num(v, 3) }

// orDash returns s, or an em dash for an empty value.
func orDash(s string) string {
	if s == "" {
		return "—"
	}
	return s
}

// countOrDash formats a count, or an em dash for zero.
func countOrDash(n int) string {
	if n == 0 {
		return "—"
	}
	return strconv.Itoa(n)
}

// lenOrDash formats a length in m, or an em dash for zero.
func lenOrDash(v float64) string {
	if v == 0 {
		return "—"
	}
	return num(v, 3)
}

// oneIn formats an annual probability of exceedance as "1/500".
func oneIn(p float64) string {
	if !(p > 0) {
		return "—"
	}
	return fmt.Sprintf("1/%.0f", 1/p)
}
