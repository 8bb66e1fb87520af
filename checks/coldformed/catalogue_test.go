package coldformed

import (
	"math"
	"testing"

	"github.com/spansweep/spansweep/catalog"
)

// Every section of the embedded catalogue gets finite, positive capacities,
// with effective properties never above gross ones (AS/NZS 4600:2018
// Section 2 only removes width).
func TestDefaultCatalogueSections(t *testing.T) {
	for _, s := range catalog.Default().Sections {
		c, err := SectionCapacities(s)
		if err != nil {
			t.Errorf("%s: %v", s.Designation, err)
			continue
		}
		if !isFlexural(s.Shape) {
			r, err := CheckTension(&c, TensionMember{}, 1000)
			if err != nil || !(r.Governing().CapacityValue > 0) {
				t.Errorf("%s: tension %v, %v", s.Designation, r.Governing(), err)
			}
			continue
		}
		vals := []float64{c.ZeTop, c.ZeBot, c.ZeY, c.AeFy, c.Vv, c.MbdTop, c.MbdBot, c.Ncd}
		for i, v := range vals {
			if !(v > 0) || (i < 5 && math.IsInf(v, 1)) {
				t.Errorf("%s: capacity %d = %g, want finite > 0", s.Designation, i, v)
			}
		}
		if c.ZeTop > s.ZxMM3*(1+1e-9) || c.ZeBot > s.ZxMM3*(1+1e-9) || c.AeFy > s.AreaMM2*(1+1e-9) {
			t.Errorf("%s: Ze %.5g/%.5g > Zx %.5g or Ae %.5g > A %.5g", s.Designation, c.ZeTop, c.ZeBot, s.ZxMM3, c.AeFy, s.AreaMM2)
		}
		mb, _ := c.MemberMoment(3000, 3000, 1, false)
		nc, _ := c.MemberCompression(EffectiveLengths{3000, 3000, 3000})
		if !(mb > 0 && mb <= c.MsBot*(1+1e-9)) || !(nc > 0 && nc <= c.Ns*(1+1e-9)) {
			t.Errorf("%s: M_b(3 m) %.5g (M_s %.5g), N_c(3 m) %.5g (N_s %.5g)", s.Designation, mb, c.MsBot, nc, c.Ns)
		}
	}
}
