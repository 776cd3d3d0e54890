import { Button, makeStyles, mergeClasses, Spinner, Text, tokens } from '@fluentui/react-components';
import { CheckmarkCircleRegular, ErrorCircleRegular, WarningRegular, EditRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { describeError } from '../forms/describe-error';
import type { SaveState } from './use-panel-autosave';

const useStyles = makeStyles({
  root: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalS, minHeight: '32px' },
  line: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  saved: { color: tokens.colorPaletteGreenForeground1 },
  problem: { color: tokens.colorPaletteRedForeground1 },
  warning: { color: tokens.colorPaletteDarkOrangeForeground1 },
  icon: { fontSize: '18px', display: 'flex' },
});

/** Where the panel's text stands with the server, announced politely as it changes. */
export function SaveStatus({ state, onRetry, onResolve }: { state: SaveState; onRetry: () => void; onResolve: () => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const content = (() => {
    switch (state.status) {
      case 'saved':
        return <span className={mergeClasses(styles.line, styles.saved)}><CheckmarkCircleRegular className={styles.icon} aria-hidden /> {t('editor.save.saved')}</span>;
      case 'pending':
        return <Text className={styles.line}><EditRegular className={styles.icon} aria-hidden /> {t('editor.save.pending')}</Text>;
      case 'saving':
        return <Spinner size="extra-tiny" label={t('editor.save.saving')} labelPosition="after" />;
      case 'invalid':
        return <Text className={mergeClasses(styles.line, styles.warning)}><WarningRegular className={styles.icon} aria-hidden /> {t('editor.save.invalid')}</Text>;
      case 'conflict':
        return (
          <>
            <Text className={mergeClasses(styles.line, styles.problem)}><WarningRegular className={styles.icon} aria-hidden /> {t('editor.save.conflict')}</Text>
            <Button size="small" appearance="primary" onClick={onResolve}>{t('editor.save.resolve')}</Button>
          </>
        );
      case 'error':
        return (
          <>
            <Text className={mergeClasses(styles.line, styles.problem)}><ErrorCircleRegular className={styles.icon} aria-hidden /> {t('editor.save.error', { reason: describeError(t, state.error) })}</Text>
            <Button size="small" onClick={onRetry}>{t('common.retry')}</Button>
          </>
        );
    }
  })();
  return <div className={styles.root} role="status" aria-live="polite" data-save-status={state.status}>{content}</div>;
}
