package bill

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// Line is one member group of the schedule.
type Line struct {
	Role         string  `json:"role"`
	Designation  string  `json:"designation"`
	Lines        int     `json:"lines"` // purlins and girts: runs along the building; 0 otherwise
	Count        int     `json:"count"`
	LengthEachM  float64 `json:"length_each_m"`
	TotalLengthM float64 `json:"total_length_m"`
	MassKg       float64 `json:"mass_kg"`
}

// FlyBraces are the fly braces of the frames.
type FlyBraces struct {
	Designation string `json:"designation"`
	PerFrame    int    `json:"per_frame"`
	Frames      int    `json:"frames"`
	Pieces      int    `json:"pieces"` // the fly-brace group's count
}

// Bridging is one run of purlin or girt bridging.
type Bridging struct {
	Role        string `json:"role"`
	RowsPerSpan int    `json:"rows_per_span"`
	Spans       int    `json:"spans"`      // bays the member lines cross
	RowsTotal   int    `json:"rows_total"` // rows per span × spans
}

// Footings are the pad footings of one type at the column bases.
type Footings struct {
	Bases        string  `json:"bases"` // which column bases: "braced bays" or "other bases"
	Count        int     `json:"count"`
	WidthM       float64 `json:"width_m"`
	DepthM       float64 `json:"depth_m"`
	ConcreteM3   float64 `json:"concrete_m3"` // all pads
	BoltSize     string  `json:"bolt_size"`
	BoltsPerBase int     `json:"bolts_per_base"`
	BoltsTotal   int     `json:"bolts_total"`
}

// Bill is the bill of materials of one solved case.
type Bill struct {
	CaseID           string     `json:"case_id"`
	Frames           int        `json:"frames"`
	Members          []Line     `json:"members"` // every group the building has, in schedule order
	Bracing          []Line     `json:"bracing"` // the roof and wall bracing lines of Members
	FlyBraces        FlyBraces  `json:"fly_braces"`
	Bridging         []Bridging `json:"bridging"`
	Footings         []Footings `json:"footings"`    // one entry per pad type
	ConcreteM3       float64    `json:"concrete_m3"` // all pads
	BoltsTotal       int        `json:"bolts_total"` // all bases
	FloorAreaM2      float64    `json:"floor_area_m2"`
	SteelMassKg      float64    `json:"steel_mass_kg"`
	MassPerFloorKgM2 float64    `json:"mass_per_floor_kg_m2"`
}

// massTolerance is how far the schedule's mass may drift from the dataset's
// steel_mass_kg by rounding (kg).
const massTolerance = 0.01

// New builds the bill of an ok row. Its total steel mass is the sum of the
// schedule's masses and must agree with the row's steel_mass_kg.
func New(r *dataset.Row) (*Bill, error) {
	if !r.OK() {
		return nil, fmt.Errorf("bill: case %s has no passing design (%s)", r.CaseID, r.Reason)
	}
	b := &Bill{CaseID: r.CaseID, Frames: r.Frames, FloorAreaM2: r.FloorAreaM2()}
	for i, role := range optimize.Roles {
		m := r.Members[i]
		if m.Count == 0 {
			continue
		}
		l := Line{Role: string(role), Designation: m.Designation, Lines: m.Lines, Count: m.Count, LengthEachM: m.LengthEachM,
			TotalLengthM: float64(m.Count) * m.LengthEachM, MassKg: m.MassKg}
		b.Members = append(b.Members, l)
		b.SteelMassKg += l.MassKg
		switch role {
		case optimize.RoleRoofBracing, optimize.RoleWallBracing:
			b.Bracing = append(b.Bracing, l)
		case optimize.RolePurlin, optimize.RoleGirt:
			if m.BridgingRows > 0 {
				b.Bridging = append(b.Bridging, Bridging{Role: string(role), RowsPerSpan: m.BridgingRows,
					Spans: r.Bays, RowsTotal: m.BridgingRows * r.Bays})
			}
		}
	}
	fly := r.Member(optimize.RoleFlyBrace)
	b.FlyBraces = FlyBraces{Designation: fly.Designation, PerFrame: r.FlyBracesPerFrame, Frames: r.Frames, Pieces: fly.Count}
	b.addFootings(Footings{Bases: "other bases", Count: r.FootingCount, WidthM: r.FootingWidthM, DepthM: r.FootingDepthM,
		ConcreteM3: r.ConcreteM3, BoltSize: r.BoltSize, BoltsPerBase: r.BoltsPerBase})
	b.addFootings(Footings{Bases: "braced bays", Count: r.BracedFootingCount, WidthM: r.BracedFootingWidthM, DepthM: r.BracedFootingDepthM,
		ConcreteM3: r.BracedConcreteM3, BoltSize: r.BracedBoltSize, BoltsPerBase: r.BracedBoltsPerBase})
	if math.Abs(b.SteelMassKg-r.SteelMassKg) > massTolerance {
		return nil, fmt.Errorf("bill: case %s: member masses sum to %.2f kg but the dataset's steel_mass_kg is %.2f kg", r.CaseID, b.SteelMassKg, r.SteelMassKg)
	}
	if b.FloorAreaM2 > 0 {
		b.MassPerFloorKgM2 = b.SteelMassKg / b.FloorAreaM2
	}
	return b, nil
}

// addFootings adds one pad type, if the building has any, to the bill and
// its totals.
func (b *Bill) addFootings(f Footings) {
	if f.Count == 0 {
		return
	}
	f.BoltsTotal = f.BoltsPerBase * f.Count
	b.Footings = append(b.Footings, f)
	b.ConcreteM3 += f.ConcreteM3
	b.BoltsTotal += f.BoltsTotal
}
