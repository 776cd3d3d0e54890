import { Link, makeStyles, MessageBar, MessageBarBody, Spinner, Text, tokens } from '@fluentui/react-components';
import { modelCardIn } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useWidgetTypes } from '../../api/widgets';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  list: { margin: 0, paddingInlineStart: tokens.spacingHorizontalXL, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  formula: { fontFamily: tokens.fontFamilyMonospace, display: 'block', direction: 'ltr', unicodeBidi: 'isolate' },
  heading: { margin: 0 },
});

/**
 * A widget's model card as the server publishes it (GET /api/widgets), in the studio's language:
 * what the model is, its equations, assumptions, where it holds and its sources.
 */
export function WidgetModelCard({ widgetType, headingLevel = 3 }: { widgetType: string; headingLevel?: 2 | 3 | 4 }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const types = useWidgetTypes();
  if (types.isPending) return <Spinner size="tiny" label={t('common.loading')} />;
  const card = types.data?.items.find((item) => item.type === widgetType)?.model;
  if (!card) return <MessageBar intent="error"><MessageBarBody>{t('modelCard.loadError')}</MessageBarBody></MessageBar>;
  const view = modelCardIn(card, i18n.resolvedLanguage ?? 'en');
  const Heading = `h${headingLevel + 1}` as 'h3' | 'h4' | 'h5';
  const section = (title: string, items: readonly string[], name: string) => (
    <>
      <Text as={Heading} weight="semibold" className={styles.heading}>{title}</Text>
      <ul className={styles.list} data-model-card={name}>
        {items.map((item) => <li key={item}>{item}</li>)}
      </ul>
    </>
  );
  return (
    <div className={styles.root} data-model-card-of={widgetType}>
      <Text as="p" className={styles.heading}>{view.summary}</Text>
      <Text as={Heading} weight="semibold" className={styles.heading}>{t('modelCard.equations')}</Text>
      <ul className={styles.list} data-model-card="equations">
        {view.equations.map((equation) => (
          <li key={equation.formula}>
            <code className={styles.formula}>{equation.formula}</code>
            {equation.meaning}
          </li>
        ))}
      </ul>
      {section(t('modelCard.assumptions'), view.assumptions, 'assumptions')}
      {section(t('modelCard.range'), view.range, 'range')}
      <Text as={Heading} weight="semibold" className={styles.heading}>{t('modelCard.sources')}</Text>
      <ul className={styles.list} data-model-card="sources">
        {view.sources.map((source) => (
          <li key={source.citation}>
            {source.citation}
            {source.doi ? <> <Link href={`https://doi.org/${source.doi}`} target="_blank" rel="noreferrer">{`doi:${source.doi}`}</Link></> : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
