import type { KeyboardEvent, PointerEvent } from 'react';

export interface DrawingSliderOptions {
  /** The drawing's viewBox size, to turn a pointer's place on screen into drawing units. */
  view: { width: number; height: number };
  /** The value a pointer at this point of the drawing sets (before the widget rounds and clamps it). */
  valueAt: (point: { x: number; y: number }) => number;
  value: number;
  /** Arrow keys move by `step`, by `fineStep` with Shift held, Page Up/Down by `pageStep`; Home and End go to the ends. */
  step: number;
  fineStep: number;
  pageStep: number;
  min: number;
  max: number;
  /** Called with the value asked for; the widget rounds and clamps it. */
  onChange: (value: number) => void;
}

type SliderEvents = {
  onPointerDown: (event: PointerEvent<SVGSVGElement>) => void;
  onPointerMove: (event: PointerEvent<SVGSVGElement>) => void;
  onKeyDown: (event: KeyboardEvent<SVGSVGElement>) => void;
};

/**
 * The handlers of a drawing that is itself a slider (role="slider"): a finger or mouse pressed on it
 * sets the value and keeps setting it while dragged (pointer capture), and the keys move it.
 */
export function drawingSliderHandlers({ view, valueAt, value, step, fineStep, pageStep, min, max, onChange }: DrawingSliderOptions): SliderEvents {
  const fromPointer = (event: PointerEvent<SVGSVGElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    if (box.width === 0 || box.height === 0) return;
    onChange(valueAt({ x: ((event.clientX - box.left) / box.width) * view.width, y: ((event.clientY - box.top) / box.height) * view.height }));
  };
  return {
    onPointerDown: (event) => {
      event.currentTarget.setPointerCapture?.(event.pointerId);
      event.currentTarget.focus();
      fromPointer(event);
    },
    onPointerMove: (event) => {
      if (event.currentTarget.hasPointerCapture?.(event.pointerId)) fromPointer(event);
    },
    onKeyDown: (event) => {
      const arrow = event.shiftKey ? fineStep : step;
      const moves: Record<string, number | undefined> = {
        ArrowUp: value + arrow,
        ArrowRight: value + arrow,
        ArrowDown: value - arrow,
        ArrowLeft: value - arrow,
        PageUp: value + pageStep,
        PageDown: value - pageStep,
        Home: min,
        End: max,
      };
      const next = moves[event.key];
      if (next === undefined) return;
      event.preventDefault();
      onChange(next);
    },
  };
}
