package coldformed

// InputName names a deciding input of a Check. Its String is the stable
// column-style name (unit in the name) used in reports and the dataset.
type InputName uint8

// Deciding inputs.
const (
	InAe           InputName = iota + 1 // effective area A_e, mm²
	InAg                                // gross area, mm²
	InAlphaNx                           // amplification α_nx
	InAlphaNy                           // amplification α_ny
	InAn                                // net area, mm²
	InAs                                // tensile stress area, mm²
	InBridgingRows                      // bridging rows per span
	InCb                                // moment-gradient factor C_b
	InCmx                               // moment factor C_mx
	InCmy                               // moment factor C_my
	InD1                                // web flat depth d1, mm
	InFoc                               // elastic buckling stress f_oc, MPa
	InFod                               // elastic distortional stress f_od, MPa
	InKt                                // force-distribution factor k_t
	InLb                                // bearing length, mm
	InLex                               // effective length l_ex, mm
	InLey                               // effective length l_ey, mm
	InLez                               // effective length l_ez, mm
	InM                                 // coincident moment, N·mm
	InMo                                // elastic buckling moment M_o, N·mm
	InN                                 // axial force, N
	InPhiNc                             // φN_c, N
	InPhiNs                             // φN_s, N
	InPhiNt                             // φN_t, N
	InR                                 // purlin reduction factor R
	InSpan                              // span, mm
	InV                                 // shear, N
	InZe                                // effective section modulus, mm³
	InZey                               // minor-axis effective modulus, mm³
)

var inputNames = [...]string{
	InAe:           "Ae_mm2",
	InAg:           "Ag_mm2",
	InAlphaNx:      "alpha_nx",
	InAlphaNy:      "alpha_ny",
	InAn:           "An_mm2",
	InAs:           "As_mm2",
	InBridgingRows: "bridging_rows",
	InCb:           "Cb",
	InCmx:          "Cmx",
	InCmy:          "Cmy",
	InD1:           "d1_mm",
	InFoc:          "foc_MPa",
	InFod:          "fod_MPa",
	InKt:           "kt",
	InLb:           "lb_mm",
	InLex:          "lex_mm",
	InLey:          "ley_mm",
	InLez:          "lez_mm",
	InM:            "M_Nmm",
	InMo:           "Mo_Nmm",
	InN:            "N_N",
	InPhiNc:        "phiNc_N",
	InPhiNs:        "phiNs_N",
	InPhiNt:        "phiNt_N",
	InR:            "R",
	InSpan:         "span_mm",
	InV:            "V_N",
	InZe:           "Ze_mm3",
	InZey:          "Zey_mm3",
}

func (n InputName) String() string {
	if int(n) < len(inputNames) && inputNames[n] != "" {
		return inputNames[n]
	}
	return "unknown"
}
