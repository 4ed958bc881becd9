/** Physical and engine-wide constants, units in the names. */
export const SPEED_OF_LIGHT_M_S = 299_792_458;
export const RAD_PER_DEG = Math.PI / 180;
export const DEG_PER_RAD = 180 / Math.PI;
export const HALF_PI = Math.PI / 2;
/** Bumped whenever a metric can change for the same design (stored sweep rows carry it). */
export const ENGINE_VERSION = '1.1.0';
