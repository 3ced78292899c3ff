export * from './takeoff-settings-schema.js';
export { defaultTakeoffSettings } from './default-takeoff-settings.js';
export { takeoffSettingSource, takeoffSettingSources } from './takeoff-setting-sources.js';
