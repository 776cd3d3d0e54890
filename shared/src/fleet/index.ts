export * from './kiosk-state.js';
export type * from './views.js';
