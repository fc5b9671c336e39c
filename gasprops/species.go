package gasprops

// This file holds the species table: molar masses, the models each species
// uses and their published coefficients.
//
// Where the numbers were read: the NASA CEA transport fits and NASA Glenn
// heat-capacity polynomials as transcribed (with their CEA data-file
// references) in the public gdtk-uq species database (src/gas/
// species-database/*.lua); the Lemmon & Jacobsen air coefficients in the
// source of Debian's python3-iapws 1.5.2 (iapws/humidAir.py); the Huber et
// al. CO2 coefficients recalled and then confirmed against several public
// implementations of that paper.

// transportKind says which published model gives a species' viscosity and
// thermal conductivity.
type transportKind int

const (
	// transportCEA: the NASA Glenn least-squares fits
	//   ln η = A ln T + B/T + C/T² + D   (η in µP)
	//   ln λ = A ln T + B/T + C/T² + D   (λ in µW/(cm·K))
	// in two intervals, 200–1000 K and 1000–5000 K. Coefficients as
	// distributed with the NASA CEA program's transport data file
	// (Gordon & McBride, NASA RP-1311, 1994/1996; Svehla, NASA TM-4647,
	// 1995); for the noble gases the fits rest on Bich, Millat & Vogel
	// (1990); for CO2 viscosity on Bousheri et al. (1987) and Svehla
	// (1994), as the data file notes.
	transportCEA transportKind = iota
	// transportAirLJ: the dilute-gas terms of Lemmon & Jacobsen,
	// "Viscosity and thermal conductivity equations for nitrogen, oxygen,
	// argon, and air", Int. J. Thermophys. 25, 21 (2004), eqs. 2–5.
	transportAirLJ
	// transportScaled: the law of corresponding states for the heavy noble
	// gases (Hirschfelder, Curtiss & Bird 1954, §8.2 and §4.1; the idea of
	// Kestin et al., J. Phys. Chem. Ref. Data 13, 229, 1984): the reduced
	// viscosity η σ²/√(M ε) is one function of T* = kT/ε, so
	//
	//	η(T) = η_ref(T ε_ref/ε) · √(M ε/(M_ref ε_ref)) · (σ_ref/σ)²
	//	λ(T) = (15/4)(R/M) η(T)
	//
	// with krypton's NASA CEA fits as the reference and the Lennard-Jones
	// σ, ε of Svehla, NASA TR R-132 (1962) as scaling parameters. Used for
	// xenon, for which no CEA fit is at hand; the reference fit is
	// extrapolated down to 155 K when xenon is at 200 K.
	transportScaled
)

// ceaFit is one interval of a NASA CEA transport fit.
type ceaFit struct{ tlo, thi, a, b, c, d float64 }

// nasa9 is one interval of a NASA Glenn 9-coefficient polynomial; only the
// seven heat-capacity coefficients are kept:
//
//	cp/R = a1 T⁻² + a2 T⁻¹ + a3 + a4 T + a5 T² + a6 T³ + a7 T⁴
//
// (McBride, Zehe & Gordon, "NASA Glenn coefficients for calculating
// thermodynamic properties of individual species", NASA/TP-2002-211556,
// 2002, eq. 4).
type nasa9 struct {
	tlo, thi float64
	a        [7]float64
}

// model holds the unexported per-species model data.
type model struct {
	monatomic bool
	noble     bool
	cp        [2]nasa9 // unused for monatomic gases (cp = 5R/2)
	cpParts   []airPart
	transport transportKind
	// low: below the CEA fits' 200 K, helium's transport comes from the
	// NIST SRD 134 table (heliumLowEval).
	low  bool
	visc [2]ceaFit
	cond [2]ceaFit
	// condCO2 replaces the CEA conductivity fit by the dilute-gas
	// reference correlation of Huber et al. (2016) for carbon dioxide.
	condCO2 bool
	// Lennard-Jones parameters: collision diameter σ in Å and well depth
	// ε/k in K (Svehla, NASA TR R-132, 1962; helium's and neon's read as
	// quoted from Svehla in the gdtk-uq species database, argon's,
	// krypton's and xenon's from memory of Svehla's table, which Poling
	// et al. 2001 Appendix B reproduces). Used for the unlike interactions
	// in mixtures and as the scaling of transportScaled.
	sigma, epsK float64
	// Lennard-Jones parameters fitted to second virial coefficients
	// (Hirschfelder, Curtiss & Bird 1954, Table I-A, from memory), Å and
	// K: used only for the cross coefficients B_ij of noble-gas mixtures.
	vsigma, vepsK float64
	// validated temperature range of every model of this species, K
	tmin, tmax float64
	// source names the models for messages: "helium model (NASA CEA fits)"
	source string
	virial virialModel
}

// airPart is one constituent of the air pseudo-component used for its
// ideal-gas heat capacity.
type airPart struct {
	sp *Species
	x  float64
}

// The species. Molar masses: IUPAC standard atomic weights (Meija et al.,
// Pure Appl. Chem. 88, 265, 2016) as used in NASA/TP-2002-211556; air's
// from Lemmon et al., J. Phys. Chem. Ref. Data 29, 331 (2000).
var (
	helium = &Species{Name: "helium", Symbol: "He", MolarMass: 4.002602e-3, m: model{
		monatomic: true, noble: true, transport: transportCEA,
		visc: [2]ceaFit{
			{200, 1000, 0.75015944, 35.763243, -2212.1291, 0.92126352},
			{1000, 5000, 0.83394166, 220.82656, -52852.591, 0.20809361}},
		cond: [2]ceaFit{
			{200, 1000, 0.75007833, 36.577987, -2363.66, 2.9766475},
			{1000, 5000, 0.83319259, 221.57417, -53304.53, 2.2684592}},
		low:   true,
		sigma: 2.551, epsK: 10.22, tmin: 100, tmax: 5000,
		source: "helium model (NASA CEA transport fits; NIST SRD 134 below 200 K)",
	}}
	neon = &Species{Name: "neon", Symbol: "Ne", MolarMass: 20.1797e-3, m: model{
		monatomic: true, noble: true, transport: transportCEA,
		visc: [2]ceaFit{
			{200, 1000, 0.68398511, 18.732366, -2366.3189, 1.8284755},
			{1000, 5000, 0.72333495, 104.20872, -25429.545, 1.4942434}},
		cond: [2]ceaFit{
			{200, 1000, 0.68509965, 19.794924, -2452.5539, 2.2586136},
			{1000, 5000, 0.72278122, 105.2829, -26355.706, 1.9367337}},
		sigma: 2.820, epsK: 32.8, tmin: 200, tmax: 5000,
		source: "neon model (NASA CEA transport fits)",
	}}
	argon = &Species{Name: "argon", Symbol: "Ar", MolarMass: 39.948e-3, m: model{
		monatomic: true, noble: true, transport: transportCEA,
		visc: [2]ceaFit{
			{200, 1000, 0.61205763, -67.714354, 190.4066, 2.1588272},
			{1000, 5000, 0.69357334, 70.953943, -28386.007, 1.4856447}},
		cond: [2]ceaFit{
			{200, 1000, 0.60968928, -70.892249, 584.20624, 1.9337152},
			{1000, 5000, 0.69075463, 62.676058, -25667.413, 1.2664189}},
		sigma: 3.542, epsK: 93.3, tmin: 200, tmax: 5000,
		source: "argon model (NASA CEA transport fits)",
	}}
	krypton = &Species{Name: "krypton", Symbol: "Kr", MolarMass: 83.798e-3, m: model{
		monatomic: true, noble: true, transport: transportCEA,
		visc: [2]ceaFit{
			{200, 1000, 0.58597795, -129.24832, 4749.5759, 2.579365},
			{1000, 5000, 0.68985845, 56.296306, -36082.6, 1.7170715}},
		cond: [2]ceaFit{
			{200, 1000, 0.58008139, -137.92556, 6077.146, 1.6420039},
			{1000, 5000, 0.68859431, 51.765647, -34512.131, 0.7433213}},
		sigma: 3.655, epsK: 178.9, tmin: 200, tmax: 5000,
		source: "krypton model (NASA CEA transport fits)",
	}}
	xenon = &Species{Name: "xenon", Symbol: "Xe", MolarMass: 131.293e-3, m: model{
		monatomic: true, noble: true, transport: transportScaled,
		sigma: 4.047, epsK: 231.0, tmin: 200, tmax: 3000,
		source: "xenon model (corresponding states from krypton)",
	}}
)

// The polyatomic gases. Heat capacities: NASA Glenn 9-coefficient
// polynomials (McBride, Zehe & Gordon, NASA/TP-2002-211556, 2002), as
// distributed in the CEA thermodynamic data file; transport: NASA CEA fits
// (see transportCEA) except air.
var (
	hydrogen = &Species{Name: "hydrogen", Symbol: "H2", MolarMass: 2.01588e-3, m: model{
		transport: transportCEA,
		cp: [2]nasa9{
			{200, 1000, [7]float64{4.078323210e+04, -8.009186040e+02, 8.214702010e+00, -1.269714457e-02, 1.753605076e-05, -1.202860270e-08, 3.368093490e-12}},
			{1000, 6000, [7]float64{5.608128010e+05, -8.371504740e+02, 2.975364532e+00, 1.252249124e-03, -3.740716190e-07, 5.936625200e-11, -3.606994100e-15}}},
		visc: [2]ceaFit{
			{200, 1000, 0.74553182, 43.555109, -3257.934, 0.13556243},
			{1000, 5000, 0.96730605, 679.31897, -210251.79, -1.8251697}},
		cond: [2]ceaFit{
			{200, 1000, 1.0059461, 279.51262, -29792.018, 1.1996252},
			{1000, 5000, 1.058245, 248.75372, 11736.907, 0.82758695}},
		tmin: 200, tmax: 5000,
		source: "hydrogen model (NASA CEA fits)",
	}}
	nitrogen = &Species{Name: "nitrogen", Symbol: "N2", MolarMass: 28.0134e-3, m: model{
		transport: transportCEA,
		cp: [2]nasa9{
			{200, 1000, [7]float64{2.210371497e+04, -3.818461820e+02, 6.082738360e+00, -8.530914410e-03, 1.384646189e-05, -9.625793620e-09, 2.519705809e-12}},
			{1000, 6000, [7]float64{5.877124060e+05, -2.239249073e+03, 6.066949220e+00, -6.139685500e-04, 1.491806679e-07, -1.923105485e-11, 1.061954386e-15}}},
		visc: [2]ceaFit{
			{200, 1000, 0.62526577, -31.779652, -1640.7983, 1.7454992},
			{1000, 5000, 0.87395209, 561.52222, -173948.09, -0.39335958}},
		cond: [2]ceaFit{
			{200, 1000, 0.85439436, 105.73224, -12347.848, 0.47793128},
			{1000, 5000, 0.88407146, 133.57293, -11429.64, 0.24417019}},
		tmin: 200, tmax: 5000,
		source: "nitrogen model (NASA CEA fits)",
	}}
	oxygen = &Species{Name: "oxygen", Symbol: "O2", MolarMass: 31.9988e-3, m: model{
		transport: transportCEA,
		cp: [2]nasa9{
			{200, 1000, [7]float64{-3.425563420e+04, 4.847000970e+02, 1.119010961e+00, 4.293889240e-03, -6.836300520e-07, -2.023372700e-09, 1.039040018e-12}},
			{1000, 6000, [7]float64{-1.037939022e+06, 2.344830282e+03, 1.819732036e+00, 1.267847582e-03, -2.188067988e-07, 2.053719572e-11, -8.193467050e-16}}},
		visc: [2]ceaFit{
			{200, 1000, 0.6091618, -52.244847, -599.74009, 2.0410801},
			{1000, 5000, 0.72216486, 175.50839, -57974.816, 1.0901044}},
		cond: [2]ceaFit{
			{200, 1000, 0.77229167, 6.846321, -5893.3377, 1.2210365},
			{1000, 5000, 0.90917351, 291.24182, -79650.171, 0.064851631}},
		tmin: 200, tmax: 5000,
		source: "oxygen model (NASA CEA fits)",
	}}
	carbonDioxide = &Species{Name: "carbon dioxide", Symbol: "CO2", MolarMass: 44.0095e-3, m: model{
		transport: transportCEA,
		cp: [2]nasa9{
			{200, 1000, [7]float64{4.943650540e+04, -6.264116010e+02, 5.301725240e+00, 2.503813816e-03, -2.127308728e-07, -7.689988780e-10, 2.849677801e-13}},
			{1000, 6000, [7]float64{1.176962419e+05, -1.788791477e+03, 8.291523190e+00, -9.223156780e-05, 4.863676880e-09, -1.891053312e-12, 6.330036590e-16}}},
		visc: [2]ceaFit{
			{200, 1000, 0.51137258, -229.51321, 13710.678, 2.7075538},
			{1000, 5000, 0.63978285, -42.637076, -15522.605, 1.6628843}},
		condCO2: true, tmin: 200, tmax: 1100,
		source: "carbon dioxide model (NASA CEA viscosity, Huber et al. 2016 conductivity)",
	}}
	// air is the dry-air pseudo-component of Lemmon et al. (2000): mole
	// fractions N2 0.7812, O2 0.2096, Ar 0.0092. Its ideal-gas heat capacity
	// is the mole-fraction average of the three NASA polynomials; its
	// transport is the dilute-gas part of Lemmon & Jacobsen (2004).
	air = &Species{Name: "air", Symbol: "air", MolarMass: 28.9586e-3, m: model{
		transport: transportAirLJ,
		sigma:     3.60, epsK: 103.3, tmin: 200, tmax: 2000,
		source: "air model (Lemmon & Jacobsen 2004)",
	}}
)

// table lists every species in the order Names reports them.
var table = []*Species{helium, neon, argon, krypton, xenon, hydrogen, nitrogen, air, carbonDioxide}

func init() {
	air.m.cpParts = []airPart{{nitrogen, 0.7812}, {oxygen, 0.2096}, {argon, 0.0092}}
}
