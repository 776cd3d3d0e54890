import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { InsightsView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useParamLabels, useWidgetName } from '../widget-params/use-param-labels';
import { FigureSection } from './FigureSection';

const useStyles = makeStyles({
  totals: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL, margin: `0 0 ${tokens.spacingVerticalL}`, padding: 0 },
  total: {
    display: 'flex', flexDirection: 'column-reverse', minWidth: '10rem', padding: tokens.spacingHorizontalL, margin: 0,
    backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge,
  },
  totalValue: { fontSize: tokens.fontSizeHero700, fontWeight: tokens.fontWeightSemibold, fontVariantNumeric: 'tabular-nums', margin: 0 },
});

const TOTALS = ['events', 'storyOpens', 'panelViews', 'widgetTouches'] as const;

/** Every figure of the range, each as a chart and a table of the same numbers. */
export function InsightsFigures({ insights }: { insights: InsightsView }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const language = i18n.resolvedLanguage ?? 'en';
  const count = new Intl.NumberFormat(language);
  const seconds = (s: number) => t('insights.seconds', { value: new Intl.NumberFormat(language, { maximumFractionDigits: 1 }).format(s) });
  const languageNames = new Intl.DisplayNames(language, { type: 'language' });
  const storyTitle = (id: number | null, title: string | null) => title ?? t('insights.deletedStory', { id: id ?? '?' });
  const widgetName = useWidgetName();
  const paramLabel = useParamLabels();

  return (
    <>
      <dl className={styles.totals}>
        {TOTALS.map((key) => (
          <div key={key} className={styles.total}>
            <dt><Text>{t(`insights.totals.${key}`)}</Text></dt>
            <dd className={styles.totalValue}>{count.format(insights.totals[key])}</dd>
          </div>
        ))}
      </dl>

      <FigureSection
        title={t('insights.stories.title')}
        chartLabel={t('insights.stories.chart')}
        columns={[t('insights.stories.story'), t('insights.stories.opens')]}
        rows={insights.stories.map((s) => ({ key: String(s.storyId), label: storyTitle(s.storyId, s.title), value: s.opens, cells: [storyTitle(s.storyId, s.title), count.format(s.opens)] }))}
      />
      <FigureSection
        title={t('insights.panels.title')}
        chartLabel={t('insights.panels.chart')}
        columns={[t('insights.panels.panel'), t('insights.panels.views'), t('insights.panels.median')]}
        format={seconds}
        decimals={1}
        rows={insights.panels.map((p) => {
          const label = p.position === null ? t('insights.deletedPanel', { id: p.panelId }) : t('insights.panels.label', { story: storyTitle(p.storyId, p.storyTitle), position: p.position });
          return { key: String(p.panelId), label, value: p.medianDwellMs / 1000, cells: [label, count.format(p.views), seconds(p.medianDwellMs / 1000)] };
        })}
      />
      <FigureSection
        title={t('insights.widgets.title')}
        chartLabel={t('insights.widgets.chart')}
        columns={[t('insights.widgets.widget'), t('insights.widgets.param'), t('insights.widgets.touches')]}
        rows={insights.widgets.flatMap((w) => w.params.map((p) => {
          const widget = widgetName(w.widgetType);
          const param = p.param ? paramLabel(w.widgetType, p.param.split('.')) : t('insights.widgets.noParam');
          return {
            key: `${w.widgetType}:${p.param ?? ''}`,
            label: `${widget} · ${param}`,
            value: p.touches,
            cells: [widget, param, count.format(p.touches)],
          };
        }))}
      />
      <FigureSection
        title={t('insights.languages.title')}
        chartLabel={t('insights.languages.chart')}
        columns={[t('insights.languages.language'), t('insights.languages.chosen')]}
        rows={insights.languages.map((l) => {
          const name = `${languageNames.of(l.locale) ?? l.locale} (${l.locale})`;
          return { key: l.locale, label: name, value: l.chosen, cells: [name, count.format(l.chosen)] };
        })}
      />
      <FigureSection
        title={t('insights.switches.title')}
        chartLabel={t('insights.switches.chart')}
        columns={[t('insights.switches.switch'), t('insights.switches.used')]}
        rows={insights.switches.map((s) => ({ key: s.switch, label: t(`insights.switches.${s.switch}`), value: s.used, cells: [t(`insights.switches.${s.switch}`), count.format(s.used)] }))}
      />
    </>
  );
}
