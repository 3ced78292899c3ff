// Public entry of @seamwright/takeoff.
// Material takeoff: units, settings (takeoff helper).
export * from './units/index.js';
export * from './settings/index.js';
export * from './materials/index.js';
export * from './cautions/index.js';
// Turf layout planner: strips, cuts, seams, cut sheet (layout helper).
export * from './layout/index.js';
// Job planner: several areas of one job planned together (job helper).
export * from './job/index.js';
// Ring measures and the planner's ring checks, for editors that draw areas on the client.
export { edgeLengths, ringPerimeter, signedArea } from './geometry/ring.js';
export { findRingProblem, findSelfContact } from './geometry/validate-rings.js';
export type { RingProblem } from './geometry/validate-rings.js';
// Roll reservation: one dye lot per product, pieces on rolls and remnants (stock helper).
export * from './stock/index.js';
