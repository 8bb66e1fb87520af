package bill

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"strconv"
	"text/tabwriter"
)

// Answer is what lookup prints: the case used, why, and its bill.
type Answer struct {
	Caution        string      `json:"caution"`
	CaseID         string      `json:"case_id"`
	GridSHA256     string      `json:"grid_sha256"`
	CatalogSHA256  string      `json:"catalog_sha256"`
	ProgramVersion string      `json:"program_version"`
	Rounding       []Dimension `json:"rounding"`
	SkippedCases   []string    `json:"skipped_no_solution"`
	Bill           *Bill       `json:"bill"`
}

// NewAnswer joins a match and its bill, with the caution every output carries.
func NewAnswer(m *Match, b *Bill, caution string) Answer {
	return Answer{Caution: caution, CaseID: m.Row.CaseID, GridSHA256: m.Row.GridSHA256, CatalogSHA256: m.Row.CatalogSHA256,
		ProgramVersion: m.Row.ProgramVersion, Rounding: m.Dimensions, SkippedCases: append([]string{}, m.Passed...), Bill: b}
}

// WriteJSON writes the answer as one indented JSON object.
func (a Answer) WriteJSON(w io.Writer) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(a)
}

func num(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

// CSVHeader is the header row of WriteCSV.
var CSVHeader = []string{"section", "item", "designation", "count", "length_each_m", "total_length_m", "mass_kg", "note"}

// WriteCSV writes the answer as CSV rows under CSVHeader: sections
// rounding, member, fly_brace, bridging, footing and bolt (one pair per pad
// type), total (concrete, bolts, steel), caution.
func (a Answer) WriteCSV(w io.Writer) error {
	cw := csv.NewWriter(w)
	b := a.Bill
	rows := [][]string{CSVHeader}
	for _, d := range a.Rounding {
		rows = append(rows, []string{"rounding", d.Name, "", "", "", "", "", fmt.Sprintf("asked %s; used %s; %s", d.Asked, d.Used, d.Why)})
	}
	for _, l := range b.Members {
		rows = append(rows, []string{"member", l.Role, l.Designation, strconv.Itoa(l.Count), num(l.LengthEachM), num(l.TotalLengthM), num(l.MassKg), ""})
	}
	f := b.FlyBraces
	rows = append(rows, []string{"fly_brace", "fly_brace", f.Designation, strconv.Itoa(f.Pieces), "", "", "",
		fmt.Sprintf("%d per frame, %d frames", f.PerFrame, f.Frames)})
	for _, br := range b.Bridging {
		rows = append(rows, []string{"bridging", br.Role, "", strconv.Itoa(br.RowsTotal), "", "", "",
			fmt.Sprintf("%d rows per span, %d spans", br.RowsPerSpan, br.Spans)})
	}
	for _, ft := range b.Footings {
		rows = append(rows,
			[]string{"footing", "pad, " + ft.Bases, "", strconv.Itoa(ft.Count), "", "", "",
				fmt.Sprintf("width_m %s, depth_m %s, concrete_m3 %s", num(ft.WidthM), num(ft.DepthM), num(ft.ConcreteM3))},
			[]string{"bolt", "holding_down_bolt, " + ft.Bases, ft.BoltSize, strconv.Itoa(ft.BoltsTotal), "", "", "", fmt.Sprintf("%d per base", ft.BoltsPerBase)})
	}
	rows = append(rows,
		[]string{"total", "concrete", "", "", "", "", "", fmt.Sprintf("concrete_m3 %s", num(b.ConcreteM3))},
		[]string{"total", "holding_down_bolts", "", strconv.Itoa(b.BoltsTotal), "", "", "", ""},
		[]string{"total", "steel", "", "", "", "", num(b.SteelMassKg), fmt.Sprintf("mass_per_floor_kg_m2 %.4g", b.MassPerFloorKgM2)},
		[]string{"caution", "", "", "", "", "", "", a.Caution},
	)
	if err := cw.WriteAll(rows); err != nil {
		return fmt.Errorf("bill: write CSV: %w", err)
	}
	return nil
}

// WriteText writes the answer as terminal tables, ending with the caution.
func (a Answer) WriteText(w io.Writer) error {
	b := a.Bill
	tw := tabwriter.NewWriter(w, 0, 4, 2, ' ', 0)
	fmt.Fprintf(tw, "Solved case used: %s\n\nRounding (never down)\tasked\tused\twhy\n", a.CaseID)
	for _, d := range a.Rounding {
		fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\n", d.Name, d.Asked, d.Used, d.Why)
	}
	for _, s := range a.SkippedCases {
		fmt.Fprintf(tw, "  skipped, no passing design: %s\n", s)
	}
	fmt.Fprintf(tw, "\nMember schedule\tdesignation\tcount\tlength each (m)\ttotal length (m)\tmass (kg)\n")
	for _, l := range b.Members {
		fmt.Fprintf(tw, "  %s\t%s\t%d\t%.3f\t%.2f\t%.1f\n", l.Role, l.Designation, l.Count, l.LengthEachM, l.TotalLengthM, l.MassKg)
	}
	fmt.Fprintf(tw, "  total steel\t\t\t\t\t%.1f\n", b.SteelMassKg)
	if err := tw.Flush(); err != nil {
		return err
	}
	f := b.FlyBraces
	fmt.Fprintf(w, "\nFrames: %d\n", b.Frames)
	fmt.Fprintf(w, "Fly braces: %d per frame, %d pieces %s\n", f.PerFrame, f.Pieces, f.Designation)
	for _, br := range b.Bridging {
		fmt.Fprintf(w, "Bridging (%s): %d row(s) per span × %d spans = %d rows\n", br.Role, br.RowsPerSpan, br.Spans, br.RowsTotal)
	}
	for _, l := range b.Bracing {
		fmt.Fprintf(w, "Bracing (%s): %d × %s, %.2f m each\n", l.Role, l.Count, l.Designation, l.LengthEachM)
	}
	for _, ft := range b.Footings {
		fmt.Fprintf(w, "Footings (%s): %d pads %.2f m square × %.2f m deep, %.2f m³; %d × %s bolts per base, %d bolts\n",
			ft.Bases, ft.Count, ft.WidthM, ft.DepthM, ft.ConcreteM3, ft.BoltsPerBase, ft.BoltSize, ft.BoltsTotal)
	}
	fmt.Fprintf(w, "Concrete: %.2f m³ in all; holding-down bolts: %d in all\n", b.ConcreteM3, b.BoltsTotal)
	fmt.Fprintf(w, "Steel mass: %.1f kg; %.2f kg/m² over %.1f m² of floor\n", b.SteelMassKg, b.MassPerFloorKgM2, b.FloorAreaM2)
	_, err := fmt.Fprintf(w, "\n%s\n", a.Caution)
	return err
}
