export * from './takeoff-settings-schema.js';
export { defaultTakeoffSettings } from './default-takeoff-settings.js';
