/**
 * Physical constants and unit conversions, all from CODATA 2018
 * (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021); NIST SP 961).
 * This is the one place such numbers live; everything else imports them.
 */

/** Bohr radius in ångström (CODATA 2018: 0.529 177 210 903 Å). */
export const BOHR_TO_ANGSTROM = 0.529177210903;
export const ANGSTROM_TO_BOHR = 1 / BOHR_TO_ANGSTROM;

/** Hartree energy in electronvolt (CODATA 2018: 27.211 386 245 988 eV). */
export const HARTREE_TO_EV = 27.211386245988;

/** Hartree energy in kJ/mol: E_h · N_A (CODATA 2018: 4.359 744 722 2071e-18 J × 6.022 140 76e23 /mol). */
export const HARTREE_TO_KJ_PER_MOL = 2625.4996394799;

/** Hartree energy in kcal/mol, via the thermochemical calorie (4.184 J exactly). */
export const HARTREE_TO_KCAL_PER_MOL = HARTREE_TO_KJ_PER_MOL / 4.184;

/** Hartree energy as a wavenumber in cm⁻¹ (CODATA 2018: 2 R∞ = 219 474.631 363 20 cm⁻¹). */
export const HARTREE_TO_INVERSE_CM = 219474.6313632;

/** Atomic unit of electric dipole moment e·a0 in debye (CODATA 2018 e·a0 = 8.478 353 6255e-30 C m; 1 D = 1e-21/c C m). */
export const AU_TO_DEBYE = 2.541746473;

/** Unified atomic mass unit in electron masses (CODATA 2018: 1 822.888 486 209). */
export const DALTON_TO_ELECTRON_MASS = 1822.888486209;
