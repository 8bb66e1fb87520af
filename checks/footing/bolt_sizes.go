package footing

// BoltSize is one metric coarse-thread bolt size with its areas.
type BoltSize struct {
	Name string
	// DiameterMM is the nominal (shank) diameter.
	DiameterMM float64
	// TensileStressAreaMM2 is As (AS 1275 / ISO 898-1; from memory).
	TensileStressAreaMM2 float64
	// CoreAreaMM2 is Ac, the minor-diameter area used when threads lie in
	// the shear plane (AS 4100:2020 cl. 9.3.2.1; from memory of AS 1275).
	CoreAreaMM2 float64
}

// ShankAreaMM2 is Ao = π d²/4, used when the shear plane crosses the shank.
func (s BoltSize) ShankAreaMM2() float64 { return pi / 4 * s.DiameterMM * s.DiameterMM }

// BoltSizes are the sizes tried, smallest first (areas from memory of
// AS 1275 / ISO 898-1 tables).
var BoltSizes = []BoltSize{
	{Name: "M12", DiameterMM: 12, TensileStressAreaMM2: 84.3, CoreAreaMM2: 76.2},
	{Name: "M16", DiameterMM: 16, TensileStressAreaMM2: 157, CoreAreaMM2: 144},
	{Name: "M20", DiameterMM: 20, TensileStressAreaMM2: 245, CoreAreaMM2: 225},
	{Name: "M24", DiameterMM: 24, TensileStressAreaMM2: 353, CoreAreaMM2: 324},
}

// BoltCounts are the bolt counts per base tried, fewest first: 2 (one row
// each side of the column) or 4 (two rows of two).
var BoltCounts = []int{2, 4}

// FufClass46MPa is f_uf, the minimum tensile strength of a property class
// 4.6 bolt: 400 MPa (AS 1111.1, from memory).
const FufClass46MPa = 400

// PhiBolt is the capacity factor for a bolt in shear, tension or combined
// shear and tension, AS 4100:2020 Table 3.4 (from memory; AS/NZS 4600 uses
// other factors for bolts in thin steel, which do not apply here).
const PhiBolt = 0.8
