package main

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/spansweep/spansweep/catalog"
)

func init() {
	commands["sections"] = command{summary: "list the catalogue's sections with their properties", run: runSections}
}

const sectionsSynopsis = `Lists every section of the catalogue (the embedded illustrative RS series, or
--catalog FILE) with its gross properties on the thin-walled centreline model.`

var sectionFormats = []string{"table", "csv", "json"}

func runSections(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("sections [--catalog FILE] [--shape C|Z|2C|strap|rod] [--format table|csv|json]", sectionsSynopsis, stdout)
	file := fs.String("catalog", "", "section catalogue CSV `FILE` (default: the embedded RS series)")
	shape := fs.String("shape", "", "list only one shape: "+catalog.ShapeList())
	format := fs.String("format", "table", "output format: "+strings.Join(sectionFormats, ", "))
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if !contains(sectionFormats, *format) {
		return usagef("--format %q: allowed %s", *format, strings.Join(sectionFormats, ", "))
	}
	cat := catalog.Default()
	if *file != "" {
		var err error
		if cat, err = catalog.LoadFile(*file); err != nil {
			return usagef("--catalog: %v", err)
		}
	}
	secs := cat.Sections
	if *shape != "" {
		s, err := catalog.ParseShape(*shape)
		if err != nil {
			return usagef("--shape %q: allowed %s", *shape, catalog.ShapeList())
		}
		secs = cat.ByShape(s)
	}
	switch *format {
	case "csv":
		return writeSectionsCSV(stdout, secs)
	case "json":
		return writeSectionsJSON(stdout, cat, secs)
	}
	return writeSectionsTable(stdout, cat, secs)
}

func contains(list []string, s string) bool {
	for _, v := range list {
		if v == s {
			return true
		}
	}
	return false
}

// sectionColumn is one output column: its key (CSV header, JSON key) and
// value; table columns carry a short heading.
type sectionColumn struct {
	key   string
	table string // heading in the table; "" to leave out of the table
	text  func(catalog.Section) string
	num   func(catalog.Section) float64
}

func textCol(key, table string, f func(catalog.Section) string) sectionColumn {
	return sectionColumn{key: key, table: table, text: f}
}

func numCol(key, table string, f func(catalog.Section) float64) sectionColumn {
	return sectionColumn{key: key, table: table, num: f}
}

// sectionColumns are the listing's columns, in order.
var sectionColumns = []sectionColumn{
	textCol("designation", "designation", func(s catalog.Section) string { return s.Designation }),
	textCol("shape", "shape", func(s catalog.Section) string { return s.Shape.String() }),
	numCol("depth_mm", "D mm", func(s catalog.Section) float64 { return s.DepthMM }),
	numCol("flange_mm", "B mm", func(s catalog.Section) float64 { return s.FlangeMM }),
	numCol("flange2_mm", "B2 mm", func(s catalog.Section) float64 { return s.Flange2MM }),
	numCol("lip_mm", "lip mm", func(s catalog.Section) float64 { return s.LipMM }),
	numCol("thickness_mm", "t mm", func(s catalog.Section) float64 { return s.ThicknessMM }),
	numCol("inner_radius_mm", "", func(s catalog.Section) float64 { return s.InnerRadiusMM }),
	numCol("area_mm2", "A mm²", func(s catalog.Section) float64 { return s.AreaMM2 }),
	numCol("mass_kg_m", "kg/m", func(s catalog.Section) float64 { return s.MassKgPerM }),
	numCol("ix_mm4", "Ix mm⁴", func(s catalog.Section) float64 { return s.IxMM4 }),
	numCol("iy_mm4", "Iy mm⁴", func(s catalog.Section) float64 { return s.IyMM4 }),
	numCol("ixy_mm4", "", func(s catalog.Section) float64 { return s.IxyMM4 }),
	numCol("i1_mm4", "", func(s catalog.Section) float64 { return s.I1MM4 }),
	numCol("i2_mm4", "", func(s catalog.Section) float64 { return s.I2MM4 }),
	numCol("principal_angle_deg", "", func(s catalog.Section) float64 { return s.PrincipalAngleRad * 180 / 3.141592653589793 }),
	numCol("zx_mm3", "Zx mm³", func(s catalog.Section) float64 { return s.ZxMM3 }),
	numCol("zy_mm3", "Zy mm³", func(s catalog.Section) float64 { return s.ZyMM3 }),
	numCol("rx_mm", "", func(s catalog.Section) float64 { return s.RxMM }),
	numCol("ry_mm", "", func(s catalog.Section) float64 { return s.RyMM }),
	numCol("j_mm4", "J mm⁴", func(s catalog.Section) float64 { return s.JMM4 }),
	numCol("iw_mm6", "Iw mm⁶", func(s catalog.Section) float64 { return s.IwMM6 }),
	numCol("shear_centre_x_mm", "", func(s catalog.Section) float64 { return s.ShearCentreXMM }),
	numCol("shear_centre_y_mm", "", func(s catalog.Section) float64 { return s.ShearCentreYMM }),
	numCol("ro1_mm", "", func(s catalog.Section) float64 { return s.RO1MM }),
	numCol("beta_x_mm", "", func(s catalog.Section) float64 { return s.BetaXMM }),
	numCol("beta_y_mm", "", func(s catalog.Section) float64 { return s.BetaYMM }),
	numCol("tensile_stress_area_mm2", "", func(s catalog.Section) float64 { return s.TensileStressAreaMM2 }),
	numCol("fy_mpa", "fy MPa", func(s catalog.Section) float64 { return s.FyMPa }),
	numCol("fu_mpa", "fu MPa", func(s catalog.Section) float64 { return s.FuMPa }),
}

// format writes a column's value with six significant figures.
func (c sectionColumn) format(s catalog.Section) string {
	if c.text != nil {
		return c.text(s)
	}
	return strconv.FormatFloat(c.num(s), 'g', 6, 64)
}

func writeSectionsCSV(w io.Writer, secs []catalog.Section) error {
	cw := csv.NewWriter(w)
	row := make([]string, len(sectionColumns))
	for i, c := range sectionColumns {
		row[i] = c.key
	}
	cw.Write(row)
	for _, s := range secs {
		for i, c := range sectionColumns {
			row[i] = c.format(s)
		}
		cw.Write(row)
	}
	cw.Flush()
	return cw.Error()
}

// sectionJSON is one section as a JSON object with keys in column order.
type sectionJSON catalog.Section

func (s sectionJSON) MarshalJSON() ([]byte, error) {
	var b strings.Builder
	b.WriteByte('{')
	for i, c := range sectionColumns {
		if i > 0 {
			b.WriteByte(',')
		}
		v := c.format(catalog.Section(s))
		if c.text != nil {
			v = strconv.Quote(v)
		}
		fmt.Fprintf(&b, "%q:%s", c.key, v)
	}
	b.WriteByte('}')
	return []byte(b.String()), nil
}

func writeSectionsJSON(w io.Writer, cat *catalog.Catalogue, secs []catalog.Section) error {
	rows := make([]sectionJSON, len(secs))
	for i, s := range secs {
		rows[i] = sectionJSON(s)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(struct {
		Catalogue string        `json:"catalogue"`
		SHA256    string        `json:"catalogue_sha256"`
		Caution   string        `json:"caution"`
		Sections  []sectionJSON `json:"sections"`
	}{cat.Name, cat.HashSHA256, caution, rows})
}

func writeSectionsTable(w io.Writer, cat *catalog.Catalogue, secs []catalog.Section) error {
	fmt.Fprintf(w, "Catalogue %s (sha256 %s), %d sections\n\n", cat.Name, cat.HashSHA256, len(secs))
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', tabwriter.AlignRight)
	var cells []string
	for _, c := range sectionColumns {
		if c.table != "" {
			cells = append(cells, c.table)
		}
	}
	fmt.Fprintln(tw, strings.Join(cells, "\t")+"\t")
	for _, s := range secs {
		cells = cells[:0]
		for _, c := range sectionColumns {
			if c.table == "" {
				continue
			}
			if c.text != nil {
				cells = append(cells, c.text(s))
			} else {
				cells = append(cells, strconv.FormatFloat(c.num(s), 'g', 4, 64))
			}
		}
		fmt.Fprintln(tw, strings.Join(cells, "\t")+"\t")
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	_, err := fmt.Fprintln(w, "\n"+caution)
	return err
}
