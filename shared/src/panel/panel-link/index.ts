export * from './panel-href.js';
export * from './panel-link.js';
