/** Reported in every result's provenance; bump with any change that can move a number. */
export const SOLVER_VERSION = '0.1.0';
