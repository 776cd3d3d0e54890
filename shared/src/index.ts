export * from './auth/roles.js';
export type * from './auth/views.js';
