import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';
import {
  Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, DialogTrigger, Field, makeStyles, Select, Text, ToggleButton, tokens,
} from '@fluentui/react-components';
import type { PanelDocJSON } from '@mantlepiece/shared';
import { PanelFrame, PanelView, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';
import { useSettingsList } from '../../api/settings';
import { useCurrentVenue } from '../../app/current-venue';
import { CHOICES_BY_NAME } from '../lists/list-search';
import { previewScreens, screenKey, zoomToFit, type PreviewScreen } from './preview-screens';

const STAGE_COLOUR = '#23282d';

const useStyles = makeStyles({
  surface: { width: 'calc(100vw - 32px)', maxWidth: 'none', height: 'calc(100vh - 32px)', padding: tokens.spacingHorizontalL, boxSizing: 'border-box' },
  body: { height: '100%', display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, maxHeight: 'none' },
  content: { flex: 1, minHeight: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, overflow: 'hidden' },
  controls: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalM },
  viewport: { flex: 1, minHeight: 0, overflow: 'auto', backgroundColor: tokens.colorNeutralBackground3, borderRadius: tokens.borderRadiusMedium },
  // The station's glass: the panel is laid out at 1920 × 1080 (or 1080 × 1920) and scaled into it as the kiosk does.
  screen: { backgroundColor: STAGE_COLOUR, display: 'flex', alignItems: 'center', justifyContent: 'center', overflow: 'hidden' },
  selection: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
});

/** The current venue's stations, for their screen sizes (a venue has a handful, well under a page). */
function useVenueStations() {
  const { venue } = useCurrentVenue();
  return useSettingsList('stations', { ...CHOICES_BY_NAME, ...(venue ? { venueId: venue.id } : {}) });
}

/** The viewport's inner size, followed as the window is resized. */
function useBoxSize() {
  const ref = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  useLayoutEffect(() => {
    const element = ref.current;
    if (!element) return undefined;
    const measure = () => setSize({ width: element.clientWidth, height: element.clientHeight });
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  return { ref, size };
}

export interface StationPreviewDialogProps {
  title: string;
  doc: PanelDocJSON;
  locale: string;
  resolveMedia: ResolveMedia;
  /** Which layout to open with: the screen the smaller preview beside it shows. */
  initialLayout?: PreviewScreen['layout'];
  onClose: () => void;
  /** Told when a selection may have ended inside the panel, with the element the panel is drawn in. */
  onSelectionEnd?: (drawing: HTMLElement) => void;
  /** Shown under the panel, e.g. the words selected for a comment. */
  footer?: ReactNode;
}

function Screen({ screen, zoom, doc, locale, resolveMedia, onSelectionEnd }: { screen: PreviewScreen; zoom: number } & Pick<StationPreviewDialogProps, 'doc' | 'locale' | 'resolveMedia' | 'onSelectionEnd'>) {
  const styles = useStyles();
  const drawing = useRef<HTMLDivElement>(null);
  const selectionEnded = () => {
    if (drawing.current) onSelectionEnd?.(drawing.current);
  };
  return (
    <div style={{ width: screen.width * zoom, height: screen.height * zoom, margin: '0 auto' }}>
      <div
        className={styles.screen}
        // Inline, so the studio's right-to-left styles do not mirror the corner the screen is scaled from.
        style={{ width: screen.width, height: screen.height, transform: `scale(${zoom})`, transformOrigin: 'top left' }}
        data-station-screen={screenKey(screen)}
      >
        <div ref={drawing} onMouseUp={selectionEnded} onKeyUp={selectionEnded} data-selectable-panel={onSelectionEnd ? '' : undefined}>
          <PanelFrame layout={screen.layout} maxWidth={screen.width} maxHeight={screen.height}>
            <PanelView doc={doc} locale={locale} layout={screen.layout} resolveMedia={resolveMedia} links="text" reducedMotion />
          </PanelFrame>
        </div>
      </div>
    </div>
  );
}

/**
 * A panel at the size of a station's screen, as that station shows it: every size the venue's
 * stations have, and the two a panel is written for. It opens at actual size (one screen pixel to
 * one CSS pixel, scrolled where the window is smaller) and zooms to fit the window on request.
 */
export function StationPreviewDialog({ title, doc, locale, resolveMedia, initialLayout = 'landscape', onClose, onSelectionEnd, footer }: StationPreviewDialogProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const stations = useVenueStations();
  const screens = previewScreens(stations.data?.items ?? []);
  const [chosen, setChosen] = useState<string | null>(null);
  const [fit, setFit] = useState(false);
  const { ref: viewport, size } = useBoxSize();
  const screen = screens.find((candidate) => screenKey(candidate) === chosen) ?? screens.find((candidate) => candidate.layout === initialLayout) ?? screens[0]!;
  const zoom = fit ? zoomToFit(screen, size) : 1;
  const shownKey = screenKey(screen);
  // Each screen and zoom starts at the panel's top-left corner, whichever way the studio's language runs.
  useLayoutEffect(() => {
    viewport.current?.scrollTo({ left: 0, top: 0 });
  }, [viewport, shownKey, zoom]);
  const describe = (candidate: PreviewScreen) => {
    const values = { width: candidate.width, height: candidate.height, orientation: t(`stationPreview.${candidate.layout}`) };
    return candidate.stations.length > 0 ? t('stationPreview.screenStations', { ...values, stations: candidate.stations.join(', ') }) : t('stationPreview.screenSize', values);
  };

  return (
    <Dialog open onOpenChange={(_event, data) => (data.open ? undefined : onClose())}>
      <DialogSurface className={styles.surface}>
        <DialogBody className={styles.body}>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent className={styles.content}>
            <div className={styles.controls}>
              <Field label={t('stationPreview.screen')}>
                <Select value={screenKey(screen)} onChange={(_event, data) => setChosen(data.value)}>
                  {screens.map((candidate) => (
                    <option key={screenKey(candidate)} value={screenKey(candidate)}>{describe(candidate)}</option>
                  ))}
                </Select>
              </Field>
              <ToggleButton checked={fit} onClick={() => setFit(true)}>{t('stationPreview.fit')}</ToggleButton>
              <ToggleButton checked={!fit} onClick={() => setFit(false)}>{t('stationPreview.actual')}</ToggleButton>
              <Text aria-live="polite" data-zoom={zoom}>{t('stationPreview.zoom', { percent: Math.round(zoom * 100) })}</Text>
            </div>
            {/* A station screen has a top-left corner whatever the studio's language: the attribute, unlike a style, is not mirrored in Arabic. */}
            <div ref={viewport} className={styles.viewport} dir="ltr" data-station-preview="" tabIndex={0} aria-label={describe(screen)} role="region">
              <Screen screen={screen} zoom={zoom} doc={doc} locale={locale} resolveMedia={resolveMedia} onSelectionEnd={onSelectionEnd} />
            </div>
            {footer}
          </DialogContent>
          <DialogActions>
            <DialogTrigger disableButtonEnhancement action="close">
              <Button appearance="primary">{t('common.close')}</Button>
            </DialogTrigger>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
