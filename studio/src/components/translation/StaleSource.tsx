import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { textPieces } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { TextDiff } from '../review/TextDiff';

const useStyles = makeStyles({
  root: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(14rem, 1fr))', gap: tokens.spacingHorizontalM },
  side: {
    display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS, padding: tokens.spacingHorizontalS,
    borderRadius: tokens.borderRadiusMedium, backgroundColor: tokens.colorNeutralBackground2,
  },
  label: { color: tokens.colorNeutralForeground3 },
});

/**
 * The source as it read when the unit was translated beside the source now, word by word: what
 * went is struck through on the left, what came is underlined on the right.
 */
export function StaleSource({ previous, current, locale }: { previous: string; current: string; locale: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const pieces = textPieces(previous, current, locale);
  return (
    <div className={styles.root} role="group" aria-label={t('unitEditor.changes')} data-stale-source>
      <div className={styles.side}>
        <Text size={200} weight="semibold" className={styles.label}>{t('unitEditor.previousSource')}</Text>
        <TextDiff pieces={pieces.filter((piece) => piece.kind !== 'added')} locale={locale} />
      </div>
      <div className={styles.side}>
        <Text size={200} weight="semibold" className={styles.label}>{t('unitEditor.currentSource')}</Text>
        <TextDiff pieces={pieces.filter((piece) => piece.kind !== 'removed')} locale={locale} />
      </div>
    </div>
  );
}
