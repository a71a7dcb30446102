/** Bumped whenever a result for the same request could change (method or reference data). */
export const ENGINE_VERSION = '1.1.0';
