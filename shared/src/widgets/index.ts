export * from './types.js';
export * from './validation.js';
export * from './registry.js';
export * from './slope-force/index.js';
export * from './convection-cell/index.js';
