import { useCallback } from 'react';
import { Badge, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { directionOf, mediaIdsIn, type TranslationPreviewPanel } from '@mantlepiece/shared';
import { PanelFrame, PanelView, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';
import { useMediaAssets } from '../../api/media';
import { useResolveMedia } from '../editor/media-resolver';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  head: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
  stage: { display: 'block', padding: tokens.spacingHorizontalS, backgroundColor: '#23282d', borderRadius: tokens.borderRadiusMedium },
  note: { color: tokens.colorNeutralForeground3 },
});

/**
 * One panel in the target locale, drawn by the kiosk's own renderer: the locale's direction sets
 * `dir`, so an Arabic or Hebrew panel is mirrored exactly as a gallery screen mirrors it.
 */
export function TranslationPreview({ panel, panelNumber, alt, locale, languageName }: {
  panel: TranslationPreviewPanel;
  panelNumber: number;
  /** Alt text per media id in the locale. */
  alt: Record<string, string>;
  locale: string;
  languageName: string;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const dir = directionOf(locale);
  const ready = useMediaAssets(mediaIdsIn(panel.doc).map(Number)).every((result) => !result.isPending);
  const fromCache = useResolveMedia(locale);
  const resolveMedia = useCallback<ResolveMedia>(
    (mediaId) => {
      const media = fromCache(mediaId);
      return media ? { ...media, alt: alt[mediaId] ?? media.alt } : null;
    },
    [fromCache, alt],
  );
  return (
    <section className={styles.root} aria-label={t('translationPreview.title', { language: languageName })}>
      <div className={styles.head}>
        <Text weight="semibold">{t('translationPreview.panel', { number: panelNumber })}</Text>
        {dir === 'rtl' ? <Badge appearance="tint" color="informative">{t('translationPreview.rightToLeft')}</Badge> : null}
      </div>
      {panel.fallbackUnitIds.length > 0 ? (
        <Text size={200} className={styles.note}>{t('translationPreview.fallback', { count: panel.fallbackUnitIds.length })}</Text>
      ) : null}
      <div className={styles.stage} data-translation-preview={locale} data-dir={dir}>
        {ready ? (
          <PanelFrame layout="landscape">
            <PanelView doc={panel.doc} locale={locale} dir={dir} layout="landscape" resolveMedia={resolveMedia} reducedMotion />
          </PanelFrame>
        ) : (
          <Spinner size="small" />
        )}
      </div>
    </section>
  );
}
