import { useMemo, useState } from 'react';
import { Card, makeStyles, MessageBar, MessageBarBody, Select, Field, Spinner, Tab, TabList, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { checkWidget, isWidgetType, WIDGET_LOCALES, widgetModule, widgetTitle, type WidgetType } from '@mantlepiece/shared';
import { SimulationCaution, WidgetDrawing } from '@mantlepiece/shared/react';
import { useWidgetTypes } from '../../api/widgets';
import { RequireArea } from '../area';
import { PageHeader } from '../../components/PageHeader';
import { WidgetModelCard } from '../../components/widget-model/WidgetModelCard';
import { WidgetParamsForm } from '../../components/widget-params/WidgetParamsForm';
import { workbenchStrings } from './workbench-strings';

type Params = Record<string, unknown>;

const useStyles = makeStyles({
  layout: { display: 'grid', gridTemplateColumns: 'minmax(18rem, 26rem) minmax(0, 1fr)', gap: tokens.spacingHorizontalXXL, alignItems: 'start' },
  column: { display: 'grid', gap: tokens.spacingVerticalL },
  numbers: { display: 'grid', gridTemplateColumns: 'auto 1fr', gap: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalL}`, margin: 0, fontVariantNumeric: 'tabular-nums' },
});

/** Nested results as "estimate.nusselt" rows, numbers to four significant figures. */
function resultRows(value: unknown, prefix = ''): [string, string][] {
  if (value === null || typeof value !== 'object') {
    return [[prefix, typeof value === 'number' ? Number(value.toPrecision(4)).toLocaleString() : String(value)]];
  }
  return Object.entries(value).flatMap(([key, child]) => resultRows(child, prefix ? `${prefix}.${key}` : key));
}

function Workbench() {
  const styles = useStyles();
  const { t, i18n } = useTranslation();
  const words = workbenchStrings(i18n.resolvedLanguage);
  const types = useWidgetTypes();
  const [chosen, setChosen] = useState<WidgetType>('slope-force');
  const [edited, setEdited] = useState<Partial<Record<WidgetType, Params>>>({});
  const [lastValid, setLastValid] = useState<Partial<Record<WidgetType, Params>>>({});
  const [locale, setLocale] = useState(i18n.resolvedLanguage ?? 'en');

  const descriptor = types.data?.items.find((item) => item.type === chosen);
  const params = edited[chosen] ?? (descriptor?.defaults as Params | undefined);
  const check = useMemo(() => (params ? checkWidget(chosen, params) : undefined), [chosen, params]);

  if (types.isPending) return <Spinner label={words.loading} />;
  if (types.isError || !descriptor || !params || !check) return <MessageBar intent="error"><MessageBarBody>{words.failed}</MessageBarBody></MessageBar>;

  const update = (next: Params) => {
    setEdited((all) => ({ ...all, [chosen]: next }));
    if (widgetModule(chosen).validate(next).ok) setLastValid((all) => ({ ...all, [chosen]: next }));
  };
  const shown = check.ok ? params : (lastValid[chosen] ?? (descriptor.defaults as Params));

  return (
    <>
      <TabList selectedValue={chosen} onTabSelect={(_, data) => isWidgetType(data.value) && setChosen(data.value)} aria-label={words.widget}>
        {types.data.items.map((item) => (
          <Tab key={item.type} value={item.type}>
            {widgetTitle(item.type, locale)}
          </Tab>
        ))}
      </TabList>
      <div className={styles.layout}>
        <section className={styles.column} aria-labelledby="workbench-settings">
          <Text as="h2" size={500} weight="semibold" id="workbench-settings">{words.settings}</Text>
          <SimulationCaution locale={locale} />
          <Field label={words.widgetLanguage}>
            <Select value={locale} onChange={(_, data) => setLocale(data.value)}>
              {WIDGET_LOCALES.map((code) => <option key={code} value={code}>{code}</option>)}
            </Select>
          </Field>
          <WidgetParamsForm key={chosen} widgetType={chosen} params={params} onChange={update} />
          <Text as="h2" size={500} weight="semibold">{t('modelCard.title')}</Text>
          <WidgetModelCard key={`model-${chosen}`} widgetType={chosen} headingLevel={2} />
        </section>
        <section className={styles.column} aria-labelledby="workbench-preview">
          <Text as="h2" size={500} weight="semibold" id="workbench-preview">{words.preview}</Text>
          {check.ok ? null : <MessageBar intent="warning"><MessageBarBody>{words.invalid}</MessageBarBody></MessageBar>}
          <Card>
            <WidgetDrawing key={chosen} widgetType={chosen} params={shown} locale={locale} onParamsChange={update} />
          </Card>
          <Text as="h3" size={400} weight="semibold">{words.description}</Text>
          <Text as="p" data-testid="widget-description">{widgetModule(chosen).describe(shown, locale)}</Text>
          {check.ok && check.warnings.length ? (
            <>
              <Text as="h3" size={400} weight="semibold">{words.warnings}</Text>
              {check.warnings.map((warning) => <MessageBar key={warning.code} intent="warning"><MessageBarBody>{warning.message}</MessageBarBody></MessageBar>)}
            </>
          ) : null}
          {check.ok ? (
            <>
              <Text as="h3" size={400} weight="semibold">{words.computed}</Text>
              <dl className={styles.numbers}>
                {resultRows(check.result).map(([name, value]) => (
                  <div key={name} style={{ display: 'contents' }}>
                    <dt>{name}</dt>
                    <dd style={{ margin: 0 }}>{value}</dd>
                  </div>
                ))}
              </dl>
            </>
          ) : null}
        </section>
      </div>
    </>
  );
}

/** `/widgets`: curators and educators try each widget's settings, see it drawn and read what it says. */
export function WidgetWorkbenchPage() {
  const { i18n } = useTranslation();
  const words = workbenchStrings(i18n.resolvedLanguage);
  return (
    <RequireArea area="stories">
      <PageHeader title={words.title} intro={words.intro} />
      <Workbench />
    </RequireArea>
  );
}
