package coldformed

// Elastic constants, AS/NZS 4600:2018 cl. 1.5 (from memory; REFERENCE-VALUES §5.1).
const (
	E  = 200000.0 // Young's modulus, MPa
	G  = 80000.0  // shear modulus, MPa
	Nu = 0.3      // Poisson's ratio
)

// Capacity reduction factors φ, AS/NZS 4600:2018 Table 1.6 (REFERENCE-VALUES §5.2).
const (
	PhiBending      = 0.90 // section and member bending; confirmed: S3
	PhiCompression  = 0.85 // members in compression; confirmed: S3, S9
	PhiShear        = 0.90 // shear; confirmed: S3
	PhiTensionGross = 0.90 // tension, gross yield; confirmed: S3
	// PhiTensionNet is taken as 0.90 on 0.85 k_t A_n f_u, the 2005 value
	// (from memory; REFERENCE-VALUES §5.2 lists 0.75 for 2018 at low
	// confidence). Doubtful: revisit against the printed standard.
	PhiTensionNet = 0.90
	// PhiRodThread applies to a threaded rod's fracture on its tensile
	// stress area, taken as the bolt-tension factor 0.80 of AS/NZS 4600:2018
	// cl. 5.3.5 (from memory).
	PhiRodThread = 0.80
)
