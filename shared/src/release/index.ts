export * from './manifest.js';
export * from './publication.js';
export * from './verify.js';
export * from './kiosk-api.js';
export * from './views.js';
export * from './pairing-code.js';
