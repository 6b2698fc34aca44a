/**
 * Least-squares expansions of Slater orbitals with exponent ζ = 1 in n Gaussians (STO-nG):
 * 1s in s Gaussians, and 2s (in s Gaussians) and 2p (in p Gaussians) sharing one set of
 * exponents. For exponent ζ the Gaussian exponents scale as ζ², the coefficients stay.
 *
 * Sources: Hehre, Stewart & Pople, J. Chem. Phys. 51, 2657 (1969), Tables I–II, and
 * Stewart, J. Chem. Phys. 52, 431 (1970). Coefficients multiply normalised primitives.
 * Entries marked "from memory of HSP (1969)" were typed from memory of those tables; each
 * was then checked against a least-squares refit done for Ketbook: refitted 1s exponents agree
 * to the printed digits, 2sp ones (a flatter fit) to about 2e-5 relative, and the printed
 * coefficients are proportional to the refitted optimal ones to about 1e-5. The test
 * tests/solver/basis/stoExpansions.test.ts checks overlaps with the Slater functions.
 * Entries marked "refitted" were not remembered reliably: they are the minimiser of the same
 * criterion (Σ over 2s and 2p of ∫(STO − Σ d_k g_k)² with shared exponents), computed for
 * Ketbook and printed to 7 significant digits; they should match the published table to
 * about its printed precision but were not compared digit by digit with it.
 */

export interface GaussianExpansion {
  exponents: readonly number[];
  coefficients: readonly number[];
}

export interface SpExpansion {
  exponents: readonly number[];
  coefficientsS: readonly number[];
  coefficientsP: readonly number[];
}

export const STO_1S: Readonly<Record<number, GaussianExpansion>> = {
  // from memory of HSP (1969) Table I
  2: { exponents: [0.851819, 0.151623], coefficients: [0.430129, 0.678914] },
  // from memory of HSP (1969) Table I
  3: { exponents: [2.22766, 0.405771, 0.109818], coefficients: [0.154329, 0.535328, 0.444635] },
  // from memory of HSP (1969) Table I
  4: {
    exponents: [5.216844, 0.9546182, 0.2652034, 0.08801862],
    coefficients: [0.05675242, 0.2601413, 0.5328461, 0.2916254],
  },
  // from memory of Stewart (1970) Table I
  5: {
    exponents: [11.30563, 2.071728, 0.5786484, 0.1975724, 0.07445219],
    coefficients: [0.02214055, 0.1135411, 0.3318161, 0.48257, 0.1935721],
  },
  // from memory of HSP (1969) Table I
  6: {
    exponents: [23.10303, 4.235915, 1.185056, 0.4070988, 0.1580884, 0.06510954],
    coefficients: [0.009163596, 0.04936149, 0.1685383, 0.3705627, 0.4164915, 0.130334],
  },
};

export const STO_2SP: Readonly<Record<number, SpExpansion>> = {
  // from memory of HSP (1969) Table II
  2: { exponents: [0.384244, 0.0974545], coefficientsS: [0.0494718, 0.963782], coefficientsP: [0.511541, 0.61282] },
  // from memory of HSP (1969) Table II
  3: {
    exponents: [0.994203, 0.231031, 0.0751386],
    coefficientsS: [-0.0999672, 0.399513, 0.700115],
    coefficientsP: [0.155916, 0.607684, 0.391957],
  },
  // refitted (see header); 7 significant digits
  4: {
    exponents: [2.323499, 0.5029884, 0.1635407, 0.06281045],
    coefficientsS: [-0.06220722, 0.00002996432, 0.5588547, 0.4977674],
    coefficientsP: [0.04368444, 0.2863794, 0.5835751, 0.2463135],
  },
  // refitted (see header); 7 significant digits
  5: {
    exponents: [5.0363, 1.032505, 0.3290601, 0.1279201, 0.05449489],
    coefficientsS: [-0.02940851, -0.06532747, 0.1289969, 0.6122898, 0.3461211],
    coefficientsP: [0.01255606, 0.1075575, 0.3735973, 0.5102397, 0.1568285],
  },
  // refitted (see header); 7 significant digits. Scaled by ζ² = 1.72² these agree to about six
  // digits with the carbon STO-6G 2sp exponents and coefficients as we remember them from the
  // published set (from memory of HSP (1969)), e.g. 30.4972, 6.03620, 1.87605 bohr⁻².
  6: {
    exponents: [10.30865, 2.040353, 0.6341406, 0.243977, 0.1059594, 0.04856898],
    coefficientsS: [-0.01325285, -0.04699181, -0.0337851, 0.2502424, 0.595117, 0.2407057],
    coefficientsP: [0.003759721, 0.03767956, 0.1738972, 0.4180365, 0.4258591, 0.1017081],
  },
};
