import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { CheckmarkCircleRegular, ErrorCircleRegular } from '@fluentui/react-icons';
import type { Placeholder } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { meaningOf, tokenOf, type PlaceholderUse } from './placeholders';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  chips: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS, margin: 0, padding: 0, listStyle: 'none' },
  placed: { color: tokens.colorPaletteGreenForeground1 },
  problem: { color: tokens.colorPaletteRedForeground1 },
  token: { unicodeBidi: 'isolate', direction: 'ltr', fontVariantNumeric: 'tabular-nums' },
  hint: { color: tokens.colorNeutralForeground3 },
});

/**
 * The unit's placeholders as buttons above the translation: each says whether it is placed once,
 * missing or repeated, and pressing it puts it where the cursor is (wrapping the selection for a pair).
 */
export function PlaceholderChips({ placeholders, uses, onInsert }: {
  placeholders: Placeholder[];
  uses: ReadonlyMap<string, PlaceholderUse>;
  onInsert: (placeholder: Placeholder) => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  if (placeholders.length === 0) return <Text size={200} className={styles.hint}>{t('unitEditor.noPlaceholders')}</Text>;
  return (
    <div className={styles.root} role="group" aria-label={t('unitEditor.placeholders')}>
      <ul className={styles.chips}>
        {placeholders.map((placeholder) => {
          const use = uses.get(placeholder.id) ?? 'missing';
          const meaning = t(`placeholderMeanings.${meaningOf(placeholder)}`);
          const token = tokenOf(placeholder);
          const label = t(placeholder.kind === 'paired' ? 'unitEditor.wrap' : 'unitEditor.insert', { token, meaning });
          return (
            <li key={placeholder.id}>
              <Button
                size="small"
                shape="circular"
                appearance={use === 'placed' ? 'secondary' : 'outline'}
                icon={use === 'placed' ? <CheckmarkCircleRegular className={styles.placed} /> : <ErrorCircleRegular className={styles.problem} />}
                // The name is the chip's own words (WCAG 2.5.3 Label in Name); what pressing does is its description.
                title={label}
                data-placeholder-chip={placeholder.id}
                data-use={use}
                // Keeps the text field's selection: a mouse press on the chip must not take focus first.
                onMouseDown={(event) => event.preventDefault()}
                onClick={() => onInsert(placeholder)}
              >
                <span className={styles.token}>{token}</span>&nbsp;{meaning}
                <span className={use === 'placed' ? styles.placed : styles.problem}>&nbsp;· {t(`unitEditor.${use}`)}</span>
              </Button>
            </li>
          );
        })}
      </ul>
      <Text size={200} className={styles.hint}>{t('unitEditor.placeholdersHint')}</Text>
    </div>
  );
}
