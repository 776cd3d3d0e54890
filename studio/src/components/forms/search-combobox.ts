import { useState } from 'react';
import type { ComboboxProps } from '@fluentui/react-components';

/** The value of the disabled "nothing matches" option, which no choice can have. */
export const NO_MATCH = '';

/**
 * A Fluent combobox that searches as it is typed in (the language and time-zone pickers): typing
 * opens the list, as a search box does (Fluent's combobox opens only on click or arrow keys), and
 * only a chosen option ends the search (Fluent also reports a cleared selection while the person
 * types). `query` is what is typed, or null when the box shows the chosen value.
 */
export function useSearchCombobox(onChoose: (value: string) => void) {
  const [query, setQuery] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const props: Pick<ComboboxProps, 'open' | 'onOpenChange' | 'onChange' | 'onOptionSelect'> = {
    open,
    onOpenChange: (_event, data) => {
      setOpen(data.open);
      if (!data.open) setQuery(null);
    },
    onChange: (event) => {
      setQuery(event.target.value);
      setOpen(true);
    },
    onOptionSelect: (_event, data) => {
      if (!data.optionValue || data.optionValue === NO_MATCH) return;
      onChoose(data.optionValue);
      setQuery(null);
    },
  };
  return { query, props };
}
