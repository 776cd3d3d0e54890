import { Text } from '@fluentui/react-components';
import { isWidgetType, widgetsIn, type RevisionPanelView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { WidgetModelCard } from '../widget-model/WidgetModelCard';
import { useWidgetName } from '../widget-params/use-param-labels';
import { useReviewStyles } from './review-styles';

/** "About this model": the model card of each kind of widget the revision's panels hold, for the educator checking the science. */
export function RevisionModelCards({ snapshot }: { snapshot: RevisionPanelView[] }) {
  const { t } = useTranslation();
  const shared = useReviewStyles();
  const widgetName = useWidgetName();
  const types = [...new Set(snapshot.flatMap((panel) => Object.values(panel.docs).flatMap((doc) => widgetsIn(doc).map((widget) => widget.widgetType))))].filter(isWidgetType);
  if (types.length === 0) return null;
  return (
    <section className={shared.card} aria-labelledby="model-cards-heading" data-model-cards="">
      <Text as="h2" id="model-cards-heading" size={500} weight="semibold" className={shared.heading}>{t('modelCard.title')}</Text>
      {types.map((type) => (
        <section key={type} aria-label={widgetName(type)}>
          <Text as="h3" size={400} weight="semibold" className={shared.heading}>{widgetName(type)}</Text>
          <WidgetModelCard widgetType={type} headingLevel={3} />
        </section>
      ))}
    </section>
  );
}
