package footing_test

import (
	"encoding/json"
	"fmt"
	"log"

	"github.com/spansweep/spansweep/checks/footing"
)

// A base of an illustrative light shed: 20 kN ULS uplift, 30 kN SLS
// downward, 3 kN shear under gravity. Sized with the default options.
func ExampleDesign() {
	b := footing.Base{
		Name: "C1",
		ULS: []footing.Reaction{
			{Combination: "1.2G+1.5Q", VerticalKN: 12, ShearKN: 3},
			{Combination: "0.9G+Wu", VerticalKN: -20},
		},
		SLS: []footing.Reaction{{Combination: "G+psi_s Q", VerticalKN: 30}},
	}
	f, err := footing.Design(b, nil, nil)
	if err != nil {
		log.Fatal(err)
	}
	p, bo := f.Pad, f.Bolts
	fmt.Printf("pad %.4g m x %.4g m, %.4g m3, governed by %s (%s %s) at %.4g\n",
		p.WidthM, p.DepthM, p.ConcreteVolumeM3, p.Governing.Name, p.Governing.Standard, p.Governing.Clause, p.Governing.Utilisation)
	fmt.Printf("bolts %d x %s, governed by %s cl. %s at %.4g\n", bo.Count, bo.Size, bo.Governing.Standard, bo.Governing.Clause, bo.Governing.Utilisation)
	js, err := json.Marshal(p.Status)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Println(string(js))
	// Output:
	// pad 1.25 m x 0.6 m, 0.9375 m3, governed by uplift (0.9 x pad weight) (AS/NZS 1170.0:2002 4.2.1(b)) at 0.9877
	// bolts 2 x M12, governed by AS 4100:2020 cl. 9.3.2.2 at 0.3707
	// "ok"
}
