export * from './invoice-money.js';
export * from './invoice-plan.js';
export * from './invoice-status.js';
