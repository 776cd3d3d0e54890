import { makeStyles, mergeClasses, Text, tokens, Tooltip } from '@fluentui/react-components';
import { measuresReadingLevel, panelText, READING_TARGETS, readingLevel, wordCount, type Audience, type PanelDocJSON } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'center', flexWrap: 'wrap' },
  measure: { display: 'inline-flex', alignItems: 'baseline', gap: tokens.spacingHorizontalXS, fontVariantNumeric: 'tabular-nums' },
  over: { color: tokens.colorPaletteRedForeground1, fontWeight: tokens.fontWeightSemibold },
  fine: { color: tokens.colorNeutralForeground2 },
});

/** Word count against the panel's budget and reading grade against the audience's target (preflight's own), as the curator writes. */
export function TextMeasures({ doc, locale, wordBudget, audience }: { doc: PanelDocJSON; locale: string; wordBudget: number; audience: Audience }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const text = panelText(doc, { locale });
  const words = wordCount(text, locale);
  const level = measuresReadingLevel(locale) ? readingLevel(text) : null;
  const target = READING_TARGETS[audience].maxGrade;
  const grade = new Intl.NumberFormat(i18n.resolvedLanguage, { maximumFractionDigits: 1 });
  const overBudget = words > wordBudget;
  const tooHard = level !== null && level.fleschKincaidGrade > target;
  return (
    <div className={styles.root} aria-live="polite">
      <Text className={mergeClasses(styles.measure, overBudget ? styles.over : styles.fine)} data-measure="words">
        {t('editor.measures.words', { count: words, budget: wordBudget })}
      </Text>
      {measuresReadingLevel(locale) ? (
        <Tooltip content={t('editor.measures.gradeHelp', { target })} relationship="description" withArrow>
          <Text className={mergeClasses(styles.measure, tooHard ? styles.over : styles.fine)} data-measure="grade" tabIndex={0}>
            {level
              ? t('editor.measures.grade', { grade: grade.format(level.fleschKincaidGrade), target, audience: t(`audiences.${audience}`) })
              : t('editor.measures.noText')}
          </Text>
        </Tooltip>
      ) : (
        <Text className={styles.fine}>{t('editor.measures.englishOnly')}</Text>
      )}
    </div>
  );
}
