export * from './median.js';
export * from './figures.js';
export * from './range.js';
export type * from './views.js';
