package main

import (
	"strings"

	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/checks/wind"
)

// siteFlags are the wind-condition flags that loads and solve share: an
// AS 4055 housing class, or an AS/NZS 1170.2 site and its multipliers.
type siteFlags struct {
	class, region    string
	terrain          float64
	importance, life int
	ms, mt, md       float64
}

// register adds the flags; the terrain and M_d defaults differ between the
// commands (solve asks for the terrain, loads assumes category 2).
func (f *siteFlags) register(fs *pflag.FlagSet, terrainDefault, mdDefault float64, mdHelp string) {
	fs.StringVar(&f.class, "wind-class", "", "AS 4055-2021 housing wind class: N1–N6, C1–C4 (instead of --region)")
	fs.StringVar(&f.region, "region", "", "AS/NZS 1170.2:2021 wind region: "+strings.Join(wind.Regions(), ", "))
	fs.Float64Var(&f.terrain, "terrain", terrainDefault, "terrain category with --region: 1, 2, 2.5, 3, 4")
	fs.IntVar(&f.importance, "importance", 2, "importance level with --region: 1–4 (AS/NZS 1170.0 Table 3.1)")
	fs.IntVar(&f.life, "life", 50, "design working life in years with --region (AS/NZS 1170.0 Table F2 rows 5, 25, 50, 100)")
	fs.Float64Var(&f.ms, "ms", 1, "shielding multiplier M_s with --region")
	fs.Float64Var(&f.mt, "mt", 1, "topographic multiplier M_t with --region")
	fs.Float64Var(&f.md, "md", mdDefault, "direction multiplier M_d with --region; "+mdHelp)
}
