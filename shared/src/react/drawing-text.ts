/**
 * Words drawn inside a widget's SVG: their size follows the kiosk's text size (Larger text), and
 * each drawing's layout function places them from estimated boxes, so a sweep test can check every
 * language, setting and text size for labels that leave the frame or meet each other.
 */

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/**
 * A generous estimate of a label's width: Lexend's widest common glyphs run about 0.62 em, digits
 * and Arabic letters less. Generous, so a label that fits here fits on screen.
 */
/** A word drawn in a widget: its text, where it is anchored (SVG text-anchor) with the middle of its line, its size and the box it takes. */
export interface DrawnLabel {
  text: string;
  x: number;
  y: number;
  anchor: 'start' | 'middle' | 'end';
  fontSize: number;
  box: Box;
}

export const textWidth = (text: string, fontSize: number): number => [...text].length * fontSize * 0.62;

/** A line of text's box: its width by estimate, its height 1.4 em, centred on `middleY`. */
export function textBox(text: string, fontSize: number, anchor: 'start' | 'middle' | 'end', x: number, middleY: number): Box {
  const width = textWidth(text, fontSize);
  const left = anchor === 'start' ? x : anchor === 'end' ? x - width : x - width / 2;
  return { x: left, y: middleY - fontSize * 0.7, width, height: fontSize * 1.4 };
}

/**
 * The size a label is drawn at: its standard size times the visitor's text scale, or, where that
 * would not fit the room it has across, the largest size that does.
 */
export const fittedFontSize = (text: string, standard: number, textScale: number, room: number): number => Math.min(standard * textScale, room / textWidth(text, 1));

export const boxesMeet = (a: Box, b: Box): boolean => a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

export const boxInside = (box: Box, view: { width: number; height: number }, margin = 0): boolean =>
  box.x >= margin && box.y >= margin && box.x + box.width <= view.width - margin && box.y + box.height <= view.height - margin;
