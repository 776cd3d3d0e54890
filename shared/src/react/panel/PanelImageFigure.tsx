import type { CSSProperties } from 'react';
import type { PanelMedia } from './panel-media.js';

const figureStyle: CSSProperties = { margin: '0.75em 0', display: 'flex', flexDirection: 'column', gap: '0.3em' };
const imageStyle: CSSProperties = { maxWidth: '100%', maxHeight: '50vh', objectFit: 'contain', alignSelf: 'center' };
const creditStyle: CSSProperties = { fontSize: '0.6em', opacity: 0.85 };
const missingStyle: CSSProperties = { ...figureStyle, padding: '1em', border: '2px dashed currentColor', textAlign: 'center' };

export interface PanelImageFigureProps {
  media: PanelMedia | null;
  /** Shown in place of an image the app cannot find (the studio says so; the kiosk passes nothing). */
  missingLabel?: string;
}

/** A panel image with its credit line, as both the kiosk renderer and the editor draw it. */
export function PanelImageFigure({ media, missingLabel }: PanelImageFigureProps) {
  if (!media) return missingLabel ? <figure style={missingStyle} data-panel-image-missing="">{missingLabel}</figure> : null;
  return (
    <figure style={figureStyle} className="mp-panel-image">
      <img src={media.src} srcSet={media.srcSet} sizes={media.sizes} alt={media.alt} width={media.width} height={media.height} style={imageStyle} decoding="async" />
      {media.credit ? <figcaption style={creditStyle}>{media.credit}</figcaption> : null}
    </figure>
  );
}
