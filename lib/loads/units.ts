// The exact conversions the checks use: 1 in = 25.4 mm and 1 ft = 0.3048 m (international yard and
// pound, 1959), 1 lbf = 4.4482216152605 N and standard gravity 9.80665 m/s² (NIST SP 811, 2008,
// App. B), so 1 psi = 6894.757 Pa and 1 plf = 14.5939 N/m.
export const MM_PER_IN = 25.4;
export const M_PER_FT = 0.3048;
export const N_PER_LBF = 4.4482216152605;
export const G = 9.80665;

export const inToMm = (inches: number) => inches * MM_PER_IN;
export const lbfToN = (lbf: number) => lbf * N_PER_LBF;
/** Pounds-force per linear foot to newtons per metre. */
export const plfToNPerM = (plf: number) => (plf * N_PER_LBF) / M_PER_FT;
export const psiToMpa = (psi: number) => (psi * N_PER_LBF) / (MM_PER_IN * MM_PER_IN);
/** Pounds-force per square foot to kilopascals. */
export const psfToKpa = (psf: number) => (psf * N_PER_LBF) / (M_PER_FT * M_PER_FT) / 1000;
