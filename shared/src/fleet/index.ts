export * from './kiosk-state.js';
export * from './report-text.js';
export type * from './views.js';
