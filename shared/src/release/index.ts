export * from './manifest.js';
export * from './verify.js';
export * from './kiosk-api.js';
