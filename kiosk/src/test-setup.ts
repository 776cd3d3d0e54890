import 'fake-indexeddb/auto';
import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

afterEach(() => cleanup());

// jsdom has no object URLs; the kiosk makes them only to hand stored image bytes to <img>.
let objectUrls = 0;
URL.createObjectURL ??= () => `blob:kiosk.test/${(objectUrls += 1)}`;
URL.revokeObjectURL ??= () => undefined;
