import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/lexend/400.css';
import '@fontsource/lexend/600.css';
import './app/i18n';
import './kiosk.css';
import { readKioskConfig } from './app/config';
import { KioskApi } from './app/kiosk-api';
import { KioskApp } from './app/KioskApp';
import { lockDown } from './app/lockdown';
import { registerAppCache } from './app/app-cache';
import { openKioskDb } from './storage/kiosk-db';
import { KioskStore } from './storage/kiosk-store';

lockDown();
if (import.meta.env.PROD) registerAppCache();

const store = new KioskStore(await openKioskDb());
// Asks the browser not to evict the releases under storage pressure: a kiosk must boot offline.
void navigator.storage?.persist?.().catch(() => false);

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <KioskApp api={new KioskApi()} store={store} config={readKioskConfig(location.search)} appVersion={__KIOSK_VERSION__} />
  </StrictMode>,
);
