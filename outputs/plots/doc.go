// Package plots draws a sweep's SVG charts: total steel mass (or mass per
// floor area) against span with one line and one power-law trend per wind
// condition, and a map of which check governs each size.
//
// Units: span in m, mass in kg, mass per floor area in kg/m². A trend is
// mass = A·span^B, so A is in kg/m^B (kg/m²/m^B for mass per floor area)
// and B is dimensionless.
//
// A Collector keeps a small point per case and draws any chart afterwards;
// a MassChart or GoverningChart is configured first and built as results
// arrive, in memory bounded by wind conditions, spans and map cells rather
// than cases, and draws the same bytes.
//
// The SVG is written by hand, element by element, with every text and
// attribute value XML-escaped, and numbers at fixed precision, so the same
// results give byte-identical files. Colours are this package's own.
//
// Every chart carries the caution as a footnote: a design aid; verify for
// the site with a qualified structural engineer; local codes and licensed
// practice govern.
package plots
