/**
 * A public screen's guard rails: no browser menu a visitor cannot close, no stuck selection or
 * zoom, no drag of images out of the page; fullscreen at the first touch, where the browser lets
 * a page ask (kiosk mode already is). Returns the undo, for tests.
 */
export function lockDown(doc: Document = document): () => void {
  const prevent = (event: Event) => event.preventDefault();
  const pinch = (event: TouchEvent) => event.touches.length > 1 && event.preventDefault();
  const ctrlZoom = (event: WheelEvent) => event.ctrlKey && event.preventDefault();
  const keyZoom = (event: KeyboardEvent) => (event.ctrlKey || event.metaKey) && ['+', '-', '=', '0'].includes(event.key) && event.preventDefault();
  const fullscreen = () => {
    if (!doc.fullscreenElement) doc.documentElement.requestFullscreen?.().catch(() => undefined);
  };
  const listeners: Array<[string, EventListener, AddEventListenerOptions]> = [
    ['contextmenu', prevent, {}],
    ['selectstart', prevent, {}],
    ['dragstart', prevent, {}],
    // Safari's own pinch events; Chromium's pinch comes as a two-finger touchmove or a ctrl+wheel.
    ['gesturestart', prevent, {}],
    ['touchmove', pinch as EventListener, { passive: false }],
    ['wheel', ctrlZoom as EventListener, { passive: false }],
    ['keydown', keyZoom as EventListener, {}],
    ['pointerdown', fullscreen, { once: true }],
  ];
  for (const [type, listener, options] of listeners) doc.addEventListener(type, listener, options);
  return () => {
    for (const [type, listener] of listeners) doc.removeEventListener(type, listener);
  };
}
