import { Accordion, AccordionHeader, AccordionItem, AccordionPanel, Field, makeStyles, MessageBar, MessageBarBody, Switch, Text, tokens } from '@fluentui/react-components';
import type { Editor } from '@tiptap/react';
import { isWidgetType, widgetModule, type PanelWidgetRef } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { WidgetParamsForm } from '../widget-params/WidgetParamsForm';
import { WidgetModelCard } from '../widget-model/WidgetModelCard';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/**
 * The settings of one widget on the panel. Every change goes straight into the document (so the
 * widget and its live values redraw at once), and a panel with a widget set wrong is not sent
 * until it is fixed. The simplified-model caution is not repeated here: the widget drawn beside
 * these settings in the editor already carries it.
 */
export function WidgetSettings({ editor, widget }: { editor: Editor; widget: PanelWidgetRef }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  if (!isWidgetType(widget.widgetType)) {
    return <MessageBar intent="error"><MessageBarBody>{t('editor.widget.unknownType', { type: widget.widgetType })}</MessageBarBody></MessageBar>;
  }
  const module = widgetModule(widget.widgetType);
  const checked = module.validate(widget.params);
  const warnings = checked.ok ? module.modelLimits(checked.params) : [];

  return (
    <section className={styles.root} aria-label={t('editor.widget.settingsOf', { name: t(`widgetTypes.${widget.widgetType}`) })}>
      <WidgetParamsForm widgetType={widget.widgetType} params={widget.params} onChange={(params) => editor.commands.setWidgetParams(widget.widgetId, params)} />
      {warnings.map((warning) => (
        <MessageBar key={warning.code} intent="warning" layout="multiline"><MessageBarBody>{warning.message}</MessageBarBody></MessageBar>
      ))}
      {checked.ok ? <Text size={200}>{module.describe(checked.params, i18n.resolvedLanguage ?? 'en')}</Text> : null}
      <Field hint={t('editor.widget.visitorModelCardHint')}>
        <Switch
          label={t('editor.widget.visitorModelCard')}
          checked={widget.visitorModelCard}
          onChange={(_event, data) => editor.commands.setWidgetModelCard(widget.widgetId, data.checked)}
        />
      </Field>
      <Accordion collapsible>
        <AccordionItem value="model">
          <AccordionHeader as="h3">{t('modelCard.title')}</AccordionHeader>
          <AccordionPanel>
            <WidgetModelCard widgetType={widget.widgetType} headingLevel={3} />
          </AccordionPanel>
        </AccordionItem>
      </Accordion>
    </section>
  );
}
