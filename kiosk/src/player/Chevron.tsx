/**
 * A drawn arrow that points the way the story reads. A typed ‹ or › is a mirrored character that
 * right-to-left text already turns round, so flipping it as well pointed Arabic arrows inward; a
 * drawing turns only by the stylesheet's mirror for [dir='rtl'].
 */
export function Chevron({ towards }: { towards: 'back' | 'forward' }) {
  return (
    <svg className="arrow" data-towards={towards} viewBox="0 0 24 24" aria-hidden="true" focusable="false">
      <path d={towards === 'forward' ? 'M9 4 L17 12 L9 20' : 'M15 4 L7 12 L15 20'} fill="none" stroke="currentColor" strokeWidth={3} strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}
