package coldformed

import (
	"math"
	"testing"
)

func TestBeamColumnInteraction(t *testing.T) {
	c := mustCaps(t, sharpC(250, 75, 18, 2.4, 5, 450, 480))
	m := BeamColumn{Compression: EffectiveLengths{Lex: 6000, Ley: 2000, Lez: 2000}, Bending: Segment{Length: 2000, Cb: 1.0}}
	// Small axial force: the linear sum of cl. 3.5.1 with N*/φN_c ≤ 0.15.
	nc, _ := c.MemberCompression(m.Compression)
	nc = math.Min(nc, c.Ncd)
	small := 0.1 * PhiCompression * nc
	r, err := CheckBeamColumn(c, m, BeamColumnActions{N: small, Mx: 5e6})
	if err != nil {
		t.Fatal(err)
	}
	mb, _ := c.MemberMoment(2000, 2000, 1, true)
	phiMb := PhiBending * math.Min(mb, c.MbdTop)
	want := 0.1 + 5e6/phiMb
	if got := findClause(t, r, "3.5.1").DemandValue; !within(got, want, 1e-9) {
		t.Errorf("linear interaction = %.5f, want %.5f", got, want)
	}
	// Larger axial force: amplified form with α_n = 1 − N*/N_e.
	big := 0.5 * PhiCompression * nc
	r, err = CheckBeamColumn(c, m, BeamColumnActions{N: big, Mx: 5e6, Cmx: 0.85})
	if err != nil {
		t.Fatal(err)
	}
	nex := math.Pi * math.Pi * E * c.Section.IxMM4 / (6000 * 6000)
	want = 0.5 + 0.85*5e6/(phiMb*(1-big/nex))
	if got := findClause(t, r, "3.5.1(a)").DemandValue; !within(got, want, 1e-9) {
		t.Errorf("amplified interaction = %.5f, want %.5f", got, want)
	}
	// Tension and bending, cl. 3.5.2.
	r, err = CheckBeamColumn(c, m, BeamColumnActions{N: -50000, Mx: 5e6})
	if err != nil {
		t.Fatal(err)
	}
	_ = findClause(t, r, "3.5.2(a)")
	_ = findClause(t, r, "3.5.2(b)")
}

func findClause(t *testing.T, r MemberResult, clause string) Check {
	t.Helper()
	for _, c := range r.Checks {
		if c.Clause == clause {
			return c
		}
	}
	t.Fatalf("no check of cl. %s in %v", clause, r.Checks)
	return Check{}
}

func TestTensionStrapAndRod(t *testing.T) {
	// Strap 50 × 1.0 G450 (f_y 450, f_u 480, AS 1397 Table 1.5, confirmed: S3):
	// gross yield 0.9 × 50 × 450 = 20 250 N; net with one 8 mm hole, k_t = 1:
	// 0.9 × 0.85 × 42 × 480 = 15 422 N governs (cl. 3.2.2).
	strap := sectionT{Designation: "strap 50x1.0", Shape: shapeStrap, FyMPa: 450, FuMPa: 480}
	strap.DepthMM, strap.ThicknessMM, strap.AreaMM2 = 50, 1, 50
	c := mustCaps(t, strap)
	r, err := CheckTension(c, TensionMember{NetArea: 42}, 10000)
	if err != nil {
		t.Fatal(err)
	}
	if g := r.Governing(); g.Clause != "3.2.2(b)" || !within(g.CapacityValue, 0.9*0.85*42*480, 1e-12) {
		t.Errorf("governing %v, want net-section fracture 15 422 N", g)
	}
	// Rod M12, tensile stress area 84.3 mm² (ISO 898-1), shank 113.1 mm²,
	// f_y 250, f_u 400 (illustrative): gross yield 0.9 × 113.1 × 250 =
	// 25 448 N governs over the thread, 0.8 × 84.3 × 400 = 26 976 N.
	rod := sectionT{Designation: "rod 12", Shape: shapeRod, FyMPa: 250, FuMPa: 400}
	rod.DepthMM, rod.AreaMM2, rod.TensileStressAreaMM2 = 12, 113.1, 84.3
	cr := mustCaps(t, rod)
	r, err = CheckTension(cr, TensionMember{}, 20000)
	if err != nil {
		t.Fatal(err)
	}
	if g := r.Governing(); g.Clause != "3.2.2(a)" || !within(g.CapacityValue, 0.9*113.1*250, 1e-12) {
		t.Errorf("rod governing %v, want gross yield 25 448 N", g)
	}
	if th := r.Checks[1]; !within(th.CapacityValue, 0.8*84.3*400, 1e-12) {
		t.Errorf("rod thread %v, want 26 976 N", th)
	}
}
