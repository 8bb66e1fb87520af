package footing

import "errors"

// Footing is the pad and the holding-down bolts of one column base.
type Footing struct {
	Pad   Pad   `json:"pad"`
	Bolts Bolts `json:"bolts"`
}

// Design sizes the pad (SizePad) and the bolts (SizeBolts) of base b. Nil
// options mean the defaults. Both results are returned even when one has
// no solution; the error then joins each part's *NoSolutionError.
func Design(b Base, pad *Options, bolts *BoltOptions) (Footing, error) {
	p, perr := SizePad(b, pad)
	if errors.Is(perr, ErrInvalid) {
		return Footing{}, perr
	}
	bo, berr := SizeBolts(b, bolts)
	if errors.Is(berr, ErrInvalid) {
		return Footing{}, berr
	}
	return Footing{Pad: p, Bolts: bo}, errors.Join(perr, berr)
}
