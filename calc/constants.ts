/** Physical and conversion constants, in one place. */

/** Speed of light in vacuum, m/s (exact by the SI definition of the metre). */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

/** Radians per degree. */
export const RAD_PER_DEG = Math.PI / 180;

/** Degrees per radian. */
export const DEG_PER_RAD = 180 / Math.PI;

/** Metres per international foot (exact). */
export const M_PER_FT = 0.3048;

/** Metres per inch (exact). */
export const M_PER_IN = 0.0254;

/** Half-wave dipole directivity over isotropic, dB (2.15 dBi; 10·log10(1.6409...)). Used for dBd = dBi − this. */
export const DIPOLE_DIRECTIVITY_DBI = 2.15;
