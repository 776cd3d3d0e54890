import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { runsFromText, type Placeholder } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { meaningOf } from './placeholders';

const useStyles = makeStyles({
  text: { margin: 0, lineHeight: tokens.lineHeightBase400, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' },
  chip: {
    display: 'inline-block',
    margin: '0 2px',
    padding: `0 ${tokens.spacingHorizontalXS}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorBrandBackground2,
    color: tokens.colorBrandForeground2,
    border: `1px solid ${tokens.colorBrandStroke2}`,
    fontSize: tokens.fontSizeBase200,
    fontWeight: tokens.fontWeightSemibold,
    lineHeight: tokens.lineHeightBase200,
    // A placeholder keeps its reading order inside right-to-left text.
    unicodeBidi: 'isolate',
    direction: 'ltr',
  },
  unknown: { backgroundColor: tokens.colorPaletteRedBackground2, color: tokens.colorPaletteRedForeground2, border: `1px solid ${tokens.colorPaletteRedBorder2}` },
});

/**
 * Unit text in the display form, with each `{n}` drawn as a chip that names what it stands for,
 * so a translator reads "bold", "live value" instead of bare numbers.
 */
export function PlaceholderText({ text, placeholders, locale, dir }: { text: string; placeholders: Placeholder[]; locale: string; dir: 'ltr' | 'rtl' }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const byId = new Map(placeholders.map((placeholder) => [placeholder.id, placeholder]));
  return (
    <p className={styles.text} lang={locale} dir={dir}>
      {runsFromText({ placeholders }, text).map((run, index) => {
        if (run.type === 'text') return <span key={index}>{run.text}</span>;
        const placeholder = byId.get(run.id);
        const meaning = placeholder ? t(`placeholderMeanings.${meaningOf(placeholder)}`) : '?';
        const token = run.type === 'close' ? `{/${run.id}}` : `{${run.id}}`;
        return (
          <span key={index} className={mergeClasses(styles.chip, !placeholder && styles.unknown)} title={meaning} data-placeholder={token}>
            {run.type === 'close' ? `/${run.id}` : `${run.id} ${meaning}`}
          </span>
        );
      })}
    </p>
  );
}
