import { Field, makeStyles, ProgressBar } from '@fluentui/react-components';
import type { LocaleCompleteness } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { minWidth: '10rem' },
  label: { fontVariantNumeric: 'tabular-nums' },
});

/** Translated units against the total, as a bar and in words; a bar that is full turns green. */
export function ProgressMeter({ progress, label }: { progress: Pick<LocaleCompleteness, 'total' | 'translated'>; label?: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const { total, translated } = progress;
  const words = t('translations.progress', { translated, total });
  return (
    <Field className={styles.root} validationMessage={words} validationState="none" label={label}>
      <ProgressBar
        value={total === 0 ? 0 : translated / total}
        max={1}
        thickness="large"
        color={total > 0 && translated === total ? 'success' : 'brand'}
        aria-label={label ?? words}
        aria-valuetext={words}
      />
    </Field>
  );
}
