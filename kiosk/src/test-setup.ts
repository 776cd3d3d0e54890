import 'fake-indexeddb/auto';
import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

afterEach(() => cleanup());

// jsdom has no object URLs; the kiosk makes them only to hand stored image bytes to <img>.
let objectUrls = 0;
if (typeof URL.createObjectURL !== 'function') URL.createObjectURL = () => `blob:kiosk.test/${(objectUrls += 1)}`;
if (typeof URL.revokeObjectURL !== 'function') URL.revokeObjectURL = () => undefined;

// jsdom has no PointerEvent; a MouseEvent carries the coordinates a swipe is measured by.
if (typeof window.PointerEvent === 'undefined') {
  class PointerEventLike extends MouseEvent {
    readonly pointerId: number;
    constructor(type: string, init: PointerEventInit = {}) {
      super(type, init);
      this.pointerId = init.pointerId ?? 1;
    }
  }
  (window as unknown as { PointerEvent: typeof PointerEventLike }).PointerEvent = PointerEventLike;
}
