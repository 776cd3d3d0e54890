import { useState } from 'react';
import { makeStyles, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { PANEL_LAYOUTS, type PanelDocJSON, type PanelLayout } from '@mantlepiece/shared';
import { PanelFrame, PanelView, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  stage: { display: 'flex', justifyContent: 'center', padding: tokens.spacingHorizontalS, backgroundColor: '#23282d', borderRadius: tokens.borderRadiusMedium },
});

/** The panel as the kiosk draws it, by the kiosk's own renderer, scaled down from a full station screen. */
export function PanelPreview({ doc, locale, resolveMedia, width }: { doc: PanelDocJSON; locale: string; resolveMedia: ResolveMedia; width: number }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [layout, setLayout] = useState<PanelLayout>('landscape');
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
    </section>
  );
}
