/** The kiosk's version from package.json, set by vite.config.ts, sent with each heartbeat. */
declare const __KIOSK_VERSION__: string;
