import { useMemo, useState } from 'react';
import { Combobox, makeStyles, Option, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { searchTimeZones, timeZoneOptions, type TimeZoneOption } from './time-zone-options';

const useStyles = makeStyles({
  offset: { color: tokens.colorNeutralForeground3, marginInlineStart: tokens.spacingHorizontalS, fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});

/** The value the option list answers with while nothing matches; never a zone. */
const NO_MATCH = '';

const labelOf = (option: TimeZoneOption) => `${option.zone} (${option.offset})`;

/**
 * A venue's time zone: a search box over every IANA zone the browser knows, each shown with its
 * offset now, answering with the zone's name. Inside a Fluent `Field`, it takes the field's label.
 */
export function TimeZonePicker({ value, onChange, disabled }: { value: string; onChange: (zone: string) => void; disabled?: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const options = useMemo(() => timeZoneOptions(new Date(), value), [value]);
  // null while the person is not searching, so the box shows the chosen zone.
  const [query, setQuery] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const found = query === null ? options : searchTimeZones(options, query);
  const chosen = options.find((option) => option.zone === value);
  return (
    <Combobox
      value={query ?? (chosen ? labelOf(chosen) : value)}
      selectedOptions={value ? [value] : []}
      disabled={disabled}
      placeholder={t('settings.timeZonePlaceholder')}
      open={open}
      onOpenChange={(_event, data) => {
        setOpen(data.open);
        if (!data.open) setQuery(null);
      }}
      // Typing opens the list, as a search box does; Fluent's combobox opens only on click or arrow keys.
      onChange={(event) => { setQuery(event.target.value); setOpen(true); }}
      // Fluent also reports a cleared selection here while the person types; only a chosen zone ends the search.
      onOptionSelect={(_event, data) => {
        if (!data.optionValue || data.optionValue === NO_MATCH) return;
        onChange(data.optionValue);
        setQuery(null);
      }}
    >
      {found.length === 0
        ? <Option key="no-match" value={NO_MATCH} text="" disabled>{t('settings.timeZoneNoMatch', { query: query ?? '' })}</Option>
        : found.map((option) => (
          <Option key={option.zone} value={option.zone} text={labelOf(option)}>
            {option.zone}<span className={styles.offset}>{option.offset}</span>
          </Option>
        ))}
    </Combobox>
  );
}
