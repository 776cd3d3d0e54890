import { useState } from 'react';
import { Button, makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { FullScreenMaximizeRegular } from '@fluentui/react-icons';
import { PANEL_LAYOUTS, type PanelDocJSON, type PanelLayout } from '@mantlepiece/shared';
import { PanelFrame, PanelView, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';
import { StationPreviewDialog } from '../preview/StationPreviewDialog';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  stage: { display: 'flex', justifyContent: 'center', padding: tokens.spacingHorizontalS, backgroundColor: '#23282d', borderRadius: tokens.borderRadiusMedium },
  full: { alignSelf: 'flex-start' },
});

/**
 * The panel as the kiosk draws it, by the kiosk's own renderer, scaled down from a full station
 * screen; "Full size" shows it at each station screen's own size.
 */
export function PanelPreview({ doc, locale, resolveMedia, width, number }: { doc: PanelDocJSON; locale: string; resolveMedia: ResolveMedia; width: number; number: number }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [layout, setLayout] = useState<PanelLayout>('landscape');
  const [fullSize, setFullSize] = useState(false);
  const { width: screenWidth, height: screenHeight } = PANEL_LAYOUTS[layout];
  return (
    <section className={styles.root} aria-label={t('editor.preview.title')}>
      <RadioGroup value={layout} onChange={(_event, data) => setLayout(data.value as PanelLayout)} aria-label={t('editor.preview.layout')}>
        <Radio value="landscape" label={t('editor.preview.landscape', PANEL_LAYOUTS.landscape)} />
        <Radio value="portrait" label={t('editor.preview.portrait', PANEL_LAYOUTS.portrait)} />
      </RadioGroup>
      <div className={styles.stage} data-preview-layout={layout} data-screen={`${screenWidth}x${screenHeight}`}>
        <PanelFrame layout={layout} maxWidth={width} maxHeight={layout === 'portrait' ? width * 1.2 : undefined}>
          <PanelView doc={doc} locale={locale} layout={layout} resolveMedia={resolveMedia} reducedMotion />
        </PanelFrame>
      </div>
      <Button className={styles.full} icon={<FullScreenMaximizeRegular />} onClick={() => setFullSize(true)}>{t('stationPreview.open')}</Button>
      {fullSize ? (
        <StationPreviewDialog
          title={t('stationPreview.title', { number })}
          doc={doc}
          locale={locale}
          resolveMedia={resolveMedia}
          initialLayout={layout}
          onClose={() => setFullSize(false)}
        />
      ) : null}
    </section>
  );
}
