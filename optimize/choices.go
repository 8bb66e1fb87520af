package optimize

import (
	"github.com/spansweep/spansweep/catalog"
)

// lineChoice is a chosen purlin or girt arrangement, which the frame and
// bracing steps read: its positions are the frame's outer-flange restraints
// and the points its reactions load the frame.
type lineChoice struct {
	Section  catalog.Section
	SpacingM float64
	// PositionsM are the lines on one side: purlins as slope distance from
	// the eave along the rafter; girts as height above the base.
	PositionsM []float64
	SpanType   string
	Bridging   int
}

// BaseReaction is the reaction of one column base under one combination:
// forces on the footing in kN and kN·m, vertical positive down (onto the
// footing), horizontal positive outward from the building.
type BaseReaction struct {
	Combination string
	LimitState  string // "ULS" or "SLS"
	VerticalKN  float64
	ShearKN     float64
	MomentKNm   float64
}

// frameChoice is the chosen portal frame, which the bracing, end-wall and
// footing steps read.
type frameChoice struct {
	Rafter, Column catalog.Section
	// Left and Right are each base's reactions under every combination;
	// the frame is symmetric but the wind is not.
	Left, Right []BaseReaction
	// RafterMomentKNm and ColumnMomentKNm are the largest ULS moment
	// magnitudes in the rafter and the column, for the restraint forces
	// the bracing takes (AS 4100:2020 cl. 6.6.2); 0 means not given, and
	// the bracing then bounds them by the section's moment capacity.
	RafterMomentKNm, ColumnMomentKNm float64
}
