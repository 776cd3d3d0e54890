import { layoutOfScreen, PANEL_LAYOUTS, type PanelLayout, type StationView } from '@mantlepiece/shared';

/** One screen size a panel can be previewed at, with the venue's stations that have it. */
export interface PreviewScreen {
  width: number;
  height: number;
  layout: PanelLayout;
  stations: string[];
}

export const screenKey = (screen: Pick<PreviewScreen, 'width' | 'height'>) => `${screen.width}x${screen.height}`;

/**
 * The screens a panel can be previewed at: the two a panel is written for (1920 × 1080 and
 * 1080 × 1920) and every other size the venue's stations have, each listing its stations by name.
 * Standard screens come first, then the rest from the largest.
 */
export function previewScreens(stations: readonly Pick<StationView, 'name' | 'screenWidthPx' | 'screenHeightPx'>[]): PreviewScreen[] {
  const screens = new Map<string, PreviewScreen>();
  const add = (width: number, height: number, station?: string) => {
    const key = screenKey({ width, height });
    const screen = screens.get(key) ?? { width, height, layout: layoutOfScreen({ width, height }), stations: [] };
    if (station !== undefined && !screen.stations.includes(station)) screen.stations.push(station);
    screens.set(key, screen);
  };
  for (const layout of Object.values(PANEL_LAYOUTS)) add(layout.width, layout.height);
  for (const station of stations) add(station.screenWidthPx, station.screenHeightPx, station.name);
  const standard = Object.values(PANEL_LAYOUTS).length;
  const all = [...screens.values()];
  return [...all.slice(0, standard), ...all.slice(standard).sort((a, b) => b.width * b.height - a.width * a.height || b.width - a.width)];
}

/** How far to scale a screen so all of it fits a viewport; 1 when the viewport is not measured yet. */
export function zoomToFit(screen: Pick<PreviewScreen, 'width' | 'height'>, viewport: { width: number; height: number }): number {
  if (viewport.width <= 0 || viewport.height <= 0) return 1;
  return Math.min(viewport.width / screen.width, viewport.height / screen.height);
}
