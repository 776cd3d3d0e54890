import type { ReactNode } from 'react';
import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { usePageTitle } from '../app/page-title';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
    flexWrap: 'wrap',
    marginBottom: tokens.spacingVerticalL,
  },
  text: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, maxWidth: '48rem' },
  title: { margin: 0 },
  intro: { color: tokens.colorNeutralForeground2, margin: 0 },
});

/** A page's one h1, its intro and its main action; also names the browser tab. */
export function PageHeader({ title, intro, actions }: { title: string; intro?: ReactNode; actions?: ReactNode }) {
  const styles = useStyles();
  usePageTitle(title);
  return (
    <header className={styles.root}>
      <div className={styles.text}>
        <Text as="h1" size={700} weight="semibold" className={styles.title}>{title}</Text>
        {intro ? <Text as="p" className={styles.intro}>{intro}</Text> : null}
      </div>
      {actions}
    </header>
  );
}
