import type { Page } from 'playwright-core';

/** Time between the drag's touch events, and the still moment before the lift, in seconds (event timestamps, no waiting). */
const STEP_S = 0.016;
const REST_S = 0.2;

/**
 * A finger on the screen, through Chromium's touch input: press, slide, rest, lift. The page's
 * context needs hasTouch. The finger rests before it lifts so the gesture ends with no speed:
 * a drag lifted moving is a fling, and Chromium spends the next tap on stopping the fling instead
 * of clicking what it touches.
 */
export async function touchDrag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }, steps = 8): Promise<void> {
  const cdp = await page.context().newCDPSession(page);
  const start = Date.now() / 1000;
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [from], timestamp: start });
  for (let step = 1; step <= steps; step++) {
    const x = from.x + ((to.x - from.x) * step) / steps;
    const y = from.y + ((to.y - from.y) * step) / steps;
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [{ x, y }], timestamp: start + step * STEP_S });
  }
  const rested = start + steps * STEP_S + REST_S;
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [to], timestamp: rested });
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [], timestamp: rested });
  await cdp.detach();
}
