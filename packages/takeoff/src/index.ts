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
