export * from './panel-image.js';
