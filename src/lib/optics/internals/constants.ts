/**
 * Exact SI constants (2019 redefinition of the SI base units, BIPM SI
 * Brochure 9th ed.): c, h and k_B are defined values, not measurements.
 */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;
export const PLANCK_J_S = 6.626_070_15e-34;
export const BOLTZMANN_J_PER_K = 1.380_649e-23;

/** h/k_B in kelvin per hertz. */
export const H_OVER_K = PLANCK_J_S / BOLTZMANN_J_PER_K;

/** ITU-T G.694.1 anchor of the fixed and flexible DWDM grids, in GHz. */
export const GRID_ANCHOR_GHZ = 193_100;

/** c in nm·THz: λ[nm] = C_NM_THZ / f[THz]. */
export const C_NM_THZ = SPEED_OF_LIGHT_M_PER_S / 1000;
