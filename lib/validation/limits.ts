export const PASSWORD_MIN_LENGTH = 10;

/** Poisson's ratio when none is given: 0.3, the usual figure for wood and metals (common practice; the column's default too). */
export const DEFAULT_POISSON = 0.3;
