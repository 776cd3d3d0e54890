import type { ReactNode } from 'react';
import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { CheckmarkCircleRegular, ErrorCircleRegular, WarningRegular } from '@fluentui/react-icons';
import type { PreflightEntry } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { groupPreflight } from './preflight-groups';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  item: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'baseline' },
  icon: { flexShrink: 0, fontSize: '16px', alignSelf: 'center' },
  blocker: { color: tokens.colorStatusDangerForeground1 },
  warning: { color: tokens.colorStatusWarningForeground1 },
  passed: { color: tokens.colorStatusSuccessForeground1 },
  summary: { cursor: 'pointer', fontWeight: tokens.fontWeightSemibold },
  heading: { margin: 0 },
});

type Kind = 'blocker' | 'warning' | 'passed';

export interface PreflightListProps {
  entries: readonly PreflightEntry[];
  /** A link to the panel a finding is about (on the review page, further down; on the story page, its editor). */
  panelLink: (panelId: number) => ReactNode;
  headingLevel?: 2 | 3;
}

/** A revision's preflight, grouped: blockers first, then warnings, then what passed (folded away). */
export function PreflightList({ entries, panelLink, headingLevel = 3 }: PreflightListProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const { blockers, warnings, passed } = groupPreflight(entries);
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const icons: Record<Kind, ReactNode> = {
    blocker: <ErrorCircleRegular className={`${styles.icon} ${styles.blocker}`} aria-hidden="true" />,
    warning: <WarningRegular className={`${styles.icon} ${styles.warning}`} aria-hidden="true" />,
    passed: <CheckmarkCircleRegular className={`${styles.icon} ${styles.passed}`} aria-hidden="true" />,
  };

  const list = (kind: Kind, items: PreflightEntry[]) => (
    <ul className={styles.list} data-preflight={kind}>
      {items.map((entry, index) => {
        const panel = entry.panelId === undefined ? null : panelLink(entry.panelId);
        return (
          <li key={`${entry.check}-${entry.panelId ?? ''}-${index}`} className={styles.item}>
            {icons[kind]}
            <Text>
              {entry.message}
              {panel ? <> · {panel}</> : null}
            </Text>
          </li>
        );
      })}
    </ul>
  );

  return (
    <div className={styles.root}>
      {blockers.length > 0 ? (
        <section className={styles.group}>
          <Text as={Heading} weight="semibold" className={styles.heading}>{t('preflight.blockers', { count: blockers.length })}</Text>
          {list('blocker', blockers)}
        </section>
      ) : (
        <Text className={styles.item}>{icons.passed}{t('preflight.noBlockers')}</Text>
      )}
      {warnings.length > 0 ? (
        <section className={styles.group}>
          <Text as={Heading} weight="semibold" className={styles.heading}>{t('preflight.warnings', { count: warnings.length })}</Text>
          {list('warning', warnings)}
        </section>
      ) : null}
      {passed.length > 0 ? (
        <details className={styles.group}>
          <summary className={styles.summary}>{t('preflight.passed', { count: passed.length })}</summary>
          {list('passed', passed)}
        </details>
      ) : null}
    </div>
  );
}
