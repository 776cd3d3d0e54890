/**
 * How the story menu splits the screen into cards, for 1 to 12 stories in either orientation: the
 * columns and rows whose cells come closest to a card's own shape (a 16:9 picture over two lines
 * of text), with no empty row.
 */

/** The menu's space on each station screen, in CSS px, once the heading and the visitor bar are taken. */
export const MENU_AREA = { landscape: { width: 1800, height: 760 }, portrait: { width: 1000, height: 1560 } } as const;
/** Width over height of a card that shows its picture and title well. */
const CARD_SHAPE = 1.15;
/** What an empty cell costs against a misshapen one: a full grid matters less than well-shaped cards. */
const EMPTY_CELL_COST = 0.25;

export type MenuOrientation = keyof typeof MENU_AREA;

export interface MenuGrid {
  columns: number;
  rows: number;
}

export function menuGrid(count: number, orientation: MenuOrientation): MenuGrid {
  const stories = Math.max(1, count);
  const area = MENU_AREA[orientation];
  let best: MenuGrid & { cost: number } = { columns: 1, rows: stories, cost: Infinity };
  for (let columns = 1; columns <= stories; columns++) {
    const rows = Math.ceil(stories / columns);
    // A last row left empty would waste a whole band of the screen.
    if ((rows - 1) * columns >= stories) continue;
    const shape = area.width / columns / (area.height / rows);
    const cost = Math.abs(Math.log(shape / CARD_SHAPE)) + EMPTY_CELL_COST * (columns * rows - stories);
    if (cost < best.cost) best = { columns, rows, cost };
  }
  return { columns: best.columns, rows: best.rows };
}
