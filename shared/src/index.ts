export * from './auth/roles.js';
export type * from './auth/views.js';
export * from './widgets/index.js';
export * from './i18n/index.js';
export * from './panel/index.js';
export * from './authoring/views.js';
export * from './release/index.js';
export * from './review/index.js';
export * from './preflight/index.js';
