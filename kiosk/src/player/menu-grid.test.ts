import { describe, expect, it } from 'vitest';
import { MENU_AREA, menuGrid } from './menu-grid';

const STORY_COUNTS = Array.from({ length: 12 }, (_, index) => index + 1);

describe('story menu grid', () => {
  it.each(['landscape', 'portrait'] as const)('fits 1 to 12 stories on a %s screen with no empty row and cards neither slivers nor strips', (orientation) => {
    for (const count of STORY_COUNTS) {
      const { columns, rows } = menuGrid(count, orientation);
      expect(columns * rows, `${count} stories`).toBeGreaterThanOrEqual(count);
      expect((rows - 1) * columns, `${count} stories leave a row empty`).toBeLessThan(count);
      // Common practice, no source: a card between twice as wide as tall and twice as tall as wide still shows its picture.
      const shape = MENU_AREA[orientation].width / columns / (MENU_AREA[orientation].height / rows);
      expect(shape, `card shape for ${count} stories`).toBeGreaterThan(0.5);
      expect(shape, `card shape for ${count} stories`).toBeLessThan(2.5);
    }
  });

  it('puts one story on the whole screen, and lays several side by side on a wide screen and one above another on a tall one', () => {
    expect(menuGrid(1, 'landscape')).toEqual({ columns: 1, rows: 1 });
    expect(menuGrid(1, 'portrait')).toEqual({ columns: 1, rows: 1 });
    expect(menuGrid(3, 'landscape')).toEqual({ columns: 3, rows: 1 });
    expect(menuGrid(3, 'portrait')).toEqual({ columns: 1, rows: 3 });
  });
});
