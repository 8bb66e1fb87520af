// Package report writes the calculation of one designed case: the
// single-case calculation report an engineer reads before certifying a size
// (Markdown or HTML, DESIGN.md §6), and the case's result as JSON.
//
// The report is built once as a format-neutral document (sections of
// paragraphs, lists, tables and force diagrams) and then rendered, so the
// Markdown and the HTML always carry the same sections and the same numbers.
// The HTML is XHTML-style (every element closed, void elements self-closed)
// so that an XML parser reads it, and draws each force diagram as an inline
// SVG figure; the Markdown gives the same diagrams as tables of values.
//
// Units are those of package optimize and DESIGN.md §3: m for building
// geometry, kN, kPa, kN·m, kg; every JSON key carries its unit in its name.
// Pressures are net and inward positive; axial force is tension positive;
// bending moment is positive with tension on the inside face of the frame.
//
// Every report and every JSON document carries the caution: the results
// are a design aid, to be verified for the site by a qualified structural
// engineer; local codes and licensed practice govern.
package report
