import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { WidgetChange, WidgetType } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useParamLabels } from '../widget-params/use-param-labels';
import { useReviewStyles } from './review-styles';

const useStyles = makeStyles({
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalL, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  params: { margin: 0, display: 'grid', gridTemplateColumns: 'max-content auto', columnGap: tokens.spacingHorizontalM, rowGap: '2px' },
  pair: { display: 'contents' },
  label: { color: tokens.colorNeutralForeground2 },
  value: { margin: 0, fontVariantNumeric: 'tabular-nums' },
  before: { textDecorationLine: 'line-through', color: tokens.colorNeutralForeground3 },
  after: { fontWeight: tokens.fontWeightSemibold },
});

const shown = (value: unknown) => (value === undefined ? '—' : typeof value === 'string' ? value : JSON.stringify(value));

/** What changed in a panel's widgets since the last approved revision: each setting before → after. */
export function WidgetChanges({ changes }: { changes: WidgetChange[] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const labelOf = useParamLabels();
  if (changes.length === 0) return <Text className={shared.muted}>{t('diff.noWidgetChanges')}</Text>;
  return (
    <ul className={styles.list} data-widget-changes>
      {changes.map((change) => {
        const name = t(`widgetTypes.${change.widgetType as WidgetType}`);
        if (change.kind !== 'changed') return <li key={`${change.kind}-${change.widgetId}`}>{t(change.kind === 'added' ? 'diff.widgetAdded' : 'diff.widgetRemoved', { name })}</li>;
        return (
          <li key={change.widgetId}>
            <Text weight="semibold">{t('diff.widgetChanged', { name })}</Text>
            <dl className={styles.params}>
              {change.params.map((param) => (
                <div key={param.path.join('.')} className={styles.pair}>
                  <dt className={styles.label}>{labelOf(change.widgetType, param.path)}</dt>
                  <dd className={styles.value}>
                    <span className={shared.visuallyHidden}>{t('diff.was')}</span>
                    <span className={styles.before}>{shown(param.before)}</span>
                    {' → '}
                    <span className={shared.visuallyHidden}>{t('diff.now')}</span>
                    <span className={styles.after}>{shown(param.after)}</span>
                  </dd>
                </div>
              ))}
            </dl>
          </li>
        );
      })}
    </ul>
  );
}
