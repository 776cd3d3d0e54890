import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import { WarningRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS, fontVariantNumeric: 'tabular-nums' },
  over: { color: tokens.colorPaletteDarkOrangeForeground1, fontWeight: tokens.fontWeightSemibold },
});

/** Characters used against the unit's length budget; past the budget it warns (the save still goes through). */
export function LengthBudget({ length, budget }: { length: number; budget: number }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const over = length - budget;
  return (
    <Text size={200} className={mergeClasses(styles.root, over > 0 && styles.over)} aria-live="polite" data-budget-over={over > 0 || undefined}>
      {over > 0 ? <WarningRegular aria-hidden="true" /> : null}
      {over > 0 ? t('unitEditor.overBudget', { over, budget }) : t('unitEditor.budget', { count: length, budget })}
    </Text>
  );
}
