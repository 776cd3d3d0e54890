// First: no schema may be built before zod is told not to probe for eval (our CSP forbids it).
import '@mantlepiece/shared/zod-jitless';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App';
import './app/global.css';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
