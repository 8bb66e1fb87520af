package plots

// windColours are the line colours of the wind conditions, in order; a
// condition beyond the list reuses a colour with a dashed line.
var windColours = []string{
	"#1f6f8b", "#c0562b", "#4f8a2c", "#7a4b9c", "#c99a1b",
	"#2c3d8f", "#a8365f", "#38958a", "#7d5530", "#59646c",
}

// checkColours are the fills of the governing-check categories, most
// frequent first; further categories share the last, "other checks".
var checkColours = []string{
	"#3b7ea1", "#e0a43a", "#6aa84f", "#c8553d", "#8e6bb8",
	"#4db6ac", "#d58bb0", "#a2865c", "#9fb4c7",
}

const (
	otherColour      = "#c9ccce" // categories beyond the palette
	noSolutionColour = "#2b2b2b"
	noDataColour     = "#ffffff"
)

// windStyle is the stroke colour and dash pattern of the i-th condition.
func windStyle(i int) (colour, dash string) {
	colour = windColours[i%len(windColours)]
	if i >= len(windColours) {
		dash = "6 3"
	}
	return colour, dash
}
