/** Properties of air used by the construction models (about 20 °C, 101.3 kPa). */

/** Density of air ρ0 in kg/m³. */
export const AIR_DENSITY_KG_M3 = 1.21;
/** Speed of sound c0 in m/s. */
export const SPEED_OF_SOUND_M_S = 343;
/** Characteristic impedance ρ0·c0 ≈ 415 Pa·s/m. */
export const AIR_IMPEDANCE_RAYL = AIR_DENSITY_KG_M3 * SPEED_OF_SOUND_M_S;
