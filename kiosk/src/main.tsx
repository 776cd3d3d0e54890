import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/lexend/400.css';
import '@fontsource/lexend/600.css';
import './app/i18n';
import './kiosk.css';
import { App } from './App';

// A public screen: a long press must not open a browser menu a visitor cannot close.
document.addEventListener('contextmenu', (event) => event.preventDefault());

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
