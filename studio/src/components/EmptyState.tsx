import type { ReactNode } from 'react';
import { makeStyles, Text, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-start',
    gap: tokens.spacingVerticalM,
    padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalXXL}`,
    borderRadius: tokens.borderRadiusLarge,
    border: `1px dashed ${tokens.colorNeutralStroke1}`,
    backgroundColor: tokens.colorNeutralBackground2,
    maxWidth: '44rem',
  },
  icon: { fontSize: '40px', color: tokens.colorBrandForeground1, display: 'flex' },
  heading: { margin: 0 },
  body: { color: tokens.colorNeutralForeground2, maxWidth: '38rem', margin: 0 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

/** What a page shows when it has nothing to list, or nothing built yet: said plainly, never faked. */
export function EmptyState({ icon, title, children, actions, headingLevel = 2 }: {
  icon?: ReactNode;
  title: string;
  children?: ReactNode;
  actions?: ReactNode;
  headingLevel?: 2 | 3;
}) {
  const styles = useStyles();
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <section className={styles.root}>
      {icon ? <span className={styles.icon} aria-hidden="true">{icon}</span> : null}
      <Text as={Heading} size={500} weight="semibold" className={styles.heading}>{title}</Text>
      {children ? <Text as="p" className={styles.body}>{children}</Text> : null}
      {actions ? <div className={styles.actions}>{actions}</div> : null}
    </section>
  );
}
