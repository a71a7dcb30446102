// Response bodies of /api/v1, described once: the OpenAPI document is generated from them and the
// API document test validates real answers against it.
export * from './common';
export * from './foundation';
export * from './analyses';
export * from './shelf';
export * from './joinery';
export * from './wall';
export * from './documents';
export * from './class-sessions';
