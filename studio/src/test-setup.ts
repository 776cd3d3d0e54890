import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

// jsdom lays nothing out, so nothing ever resizes; Fluent's MessageBar still asks to be told.
globalThis.ResizeObserver ??= class {
  observe() {}
  unobserve() {}
  disconnect() {}
};

afterEach(() => cleanup());
