import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import { WarningRegular } from '@fluentui/react-icons';
import type { UnitKind } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS, fontVariantNumeric: 'tabular-nums' },
  over: { color: tokens.colorPaletteDarkOrangeForeground1, fontWeight: tokens.fontWeightSemibold },
});

/**
 * Characters used against the unit's length budget; past the budget it warns (the save still goes
 * through). Alt text is never on the screen, so its warning is about listening, not fitting.
 */
export function LengthBudget({ length, budget, kind }: { length: number; budget: number; kind: UnitKind }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const over = length - budget;
  return (
    <Text size={200} className={mergeClasses(styles.root, over > 0 && styles.over)} aria-live="polite" data-budget-over={over > 0 || undefined}>
      {over > 0 ? <WarningRegular aria-hidden="true" /> : null}
      {over > 0 ? t(kind === 'altText' ? 'unitEditor.overBudgetAltText' : 'unitEditor.overBudget', { over, budget }) : t('unitEditor.budget', { count: length, budget })}
    </Text>
  );
}
