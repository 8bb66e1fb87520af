package catalog_test

import (
	"fmt"
	"strings"

	"github.com/spansweep/spansweep/catalog"
)

func ExampleDefault() {
	c, ok := catalog.Default().Find("C200x75x1.9")
	if !ok {
		fmt.Println("not found")
		return
	}
	fmt.Printf("%s: A %.4g mm², %.4g kg/m, Ix %.4g mm⁴, Zx %.4g mm³, fy %g MPa\n",
		c.Designation, c.AreaMM2, c.MassKgPerM, c.IxMM4, c.ZxMM3, c.FyMPa)
	lightest := catalog.Default().ByShape(catalog.ShapeZ)[0]
	fmt.Println("lightest Z:", lightest.Designation)
	// Output:
	// C200x75x1.9: A 700.3 mm², 5.498 kg/m, Ix 4.303e+06 mm⁴, Zx 4.303e+04 mm³, fy 450 MPa
	// lightest Z: Z100x1.0
}

func ExampleComputeProperties() {
	p, err := catalog.ComputeProperties(catalog.ShapeZ, catalog.Geometry{
		DepthMM: 200, FlangeMM: 75, Flange2MM: 75, LipMM: 18, ThicknessMM: 2, InnerRadiusMM: 5,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Ix %.4g, Iy %.4g, Ixy %.4g, I1 %.4g, I2 %.4g mm⁴\n", p.IxMM4, p.IyMM4, p.IxyMM4, p.I1MM4, p.I2MM4)
	// Output:
	// Ix 4.657e+06, Iy 9.624e+05, Ixy 1.572e+06, I1 5.235e+06, I2 3.84e+05 mm⁴
}

func ExampleLoad() {
	csv := strings.Join(catalog.Columns, ",") + "\n" +
		"C150x60x1.5,C,150,60,,15,1.5,3.75,450,480\n" +
		"C150x60x0,C,150,60,,15,0,3.75,450,480\n"
	_, err := catalog.Load(strings.NewReader(csv), "mine.csv")
	fmt.Println(err)
	// Output:
	// catalog mine.csv: 1 problem
	//   mine.csv: line 3: thickness_mm = "0": allowed 0 < value ≤ 10 mm
}
