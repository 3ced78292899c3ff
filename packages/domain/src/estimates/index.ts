export * from './money.js';
export * from './estimate-lines.js';
export * from './price-takeoff.js';
