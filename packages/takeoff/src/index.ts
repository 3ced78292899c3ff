// Public entry of @seamwright/takeoff.
// Material takeoff: units, settings (takeoff helper).
export * from './units/index.js';
export * from './settings/index.js';
export * from './materials/index.js';
export * from './cautions/index.js';
