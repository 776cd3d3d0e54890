export * from './median.js';
export * from './figures.js';
export type * from './views.js';
