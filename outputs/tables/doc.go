// Package tables builds the brochure span tables from a sweep's results:
// one table per wind condition and eaves height (and per roof pitch, base
// fixity and hoist load where the grid varies them), rows of span, columns
// of building length (bays × bay spacing), each cell naming the frame
// sections (rafter / column), the purlin section and spacing and the total
// steel mass, and writes them as CSV, Markdown and a printable HTML page.
//
// Units: m for building geometry and spacing, degrees for pitch, kN for
// hoist loads, kg for mass and kg/m for mass per metre of a section. Every
// field carries its unit in its name.
//
// An Accumulator takes results in any order and keeps only the cells (a
// few strings and numbers per case). A Stream takes them in grid order
// (grouped by wind condition and eaves height) and holds one group's cells
// at a time, spooling finished tables to a file, so a sweep of any size
// writes its tables in flat memory; both write the same bytes. Output is
// deterministic: the same results give byte-identical files, and the order
// of tables, rows and columns depends on the cases, not on arrival order.
//
// The optional envelope raises each cell's rafter, column and purlin to the
// heaviest section (by mass per metre) of any cell at or below it in span
// and length within its table, so a larger building never lists a lighter
// section than a smaller one. Raised cells are marked; their sections are
// not re-checked, and their mass is scaled from the design (see Envelope).
//
// Every output carries the caution: a design aid; verify for the site with
// a qualified structural engineer; local codes and licensed practice govern.
package tables
