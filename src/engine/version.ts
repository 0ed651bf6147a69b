/** The engine's version, recorded in every solve record; the minor part is bumped whenever results could change. */
export const ENGINE_VERSION = '0.3.0';
