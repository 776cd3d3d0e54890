export * from './live-value.js';
export * from './live-value-format.js';
export * from './live-value-reading.js';
