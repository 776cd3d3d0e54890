import { useLayoutEffect, useRef, useState, type CSSProperties, type ReactNode } from 'react';
import { PANEL_LAYOUTS, type PanelLayout } from '../../panel/panel-presentation.js';

export interface PanelFrameProps {
  layout: PanelLayout;
  /** The preview box; without one the frame fills the width of its parent. */
  maxWidth?: number;
  maxHeight?: number;
  children: ReactNode;
}

/**
 * Scales a full-size panel (1920×1080 or 1080×1920) down to a preview box, so the studio shows
 * exactly what the station shows, line breaks and all, only smaller.
 */
export function PanelFrame({ layout, maxWidth, maxHeight, children }: PanelFrameProps) {
  const { width, height } = PANEL_LAYOUTS[layout];
  const outer = useRef<HTMLDivElement>(null);
  const [measured, setMeasured] = useState<number | null>(null);

  useLayoutEffect(() => {
    const element = outer.current?.parentElement;
    if (maxWidth !== undefined || !element || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setMeasured(entry?.contentRect.width ?? null));
    observer.observe(element);
    return () => observer.disconnect();
  }, [maxWidth]);

  const boxWidth = maxWidth ?? measured ?? width;
  const scale = Math.min(1, boxWidth / width, maxHeight === undefined ? 1 : maxHeight / height);
  const outerStyle: CSSProperties = { width: width * scale, height: height * scale, overflow: 'hidden', position: 'relative' };
  const innerStyle: CSSProperties = { width, height, transform: `scale(${scale})`, transformOrigin: 'top left', position: 'absolute', top: 0, left: 0 };
  return (
    <div ref={outer} className="mp-panel-frame" data-layout={layout} style={outerStyle}>
      <div style={innerStyle}>{children}</div>
    </div>
  );
}
