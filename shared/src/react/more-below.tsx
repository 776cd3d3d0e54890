import { useLayoutEffect, useState, type RefObject } from 'react';

/**
 * Whether a scrolling element has more below what shows: watched on scroll and whenever it or
 * anything in it changes size (a picture arriving, a widget growing, larger text). `content` is
 * what it shows; a new one is watched afresh.
 */
export function useMoreBelow(scroller: RefObject<HTMLElement | null>, content: unknown): boolean {
  const [more, setMore] = useState(false);
  useLayoutEffect(() => {
    const element = scroller.current;
    if (!element) return undefined;
    const check = () => setMore(element.scrollHeight - element.scrollTop - element.clientHeight > 2);
    check();
    element.addEventListener('scroll', check, { passive: true });
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(check);
    observer?.observe(element);
    for (const child of element.children) observer?.observe(child);
    return () => {
      element.removeEventListener('scroll', check);
      observer?.disconnect();
    };
  }, [scroller, content]);
  return more;
}

/** Where the cue sits in its scroller and the colours it is drawn in, as CSS values. */
export interface MoreBelowLook {
  /** The scroller's padding at its foot and at its sides: the fade reaches over them to the edge. */
  padBlock: string;
  padInline: string;
  /** What the words fade into: the scroller's background. */
  fade: string;
  /** The arrow's button-like disc. */
  surface: string;
  text: string;
  border: string;
}

/**
 * The cue that a scroller goes on below the screen's edge: what is there fades out and a down arrow
 * sits at the foot, until the visitor has scrolled to the end. Drawn only, as the scrolling itself
 * is what a screen reader follows. Place it last inside the scroller.
 */
export function MoreBelowCue({ look }: { look: MoreBelowLook }) {
  return (
    <div className="mp-more-below" aria-hidden="true" style={{ position: 'sticky', bottom: `calc(-1 * ${look.padBlock})`, height: 0, pointerEvents: 'none' }}>
      <div style={{ position: 'absolute', insetInline: `calc(-1 * ${look.padInline})`, bottom: 0, height: '5em', background: `linear-gradient(to bottom, transparent, ${look.fade} 75%)` }} />
      <svg viewBox="0 0 24 24" style={{ position: 'absolute', left: '50%', bottom: '0.4em', width: '2.6em', height: '2.6em', marginLeft: '-1.3em', borderRadius: '50%', background: look.surface, color: look.text, border: `3px solid ${look.border}` }}>
        <path d="M6 9 L12 15 L18 9" fill="none" stroke="currentColor" strokeWidth={2.5} strokeLinecap="round" strokeLinejoin="round" />
      </svg>
    </div>
  );
}
