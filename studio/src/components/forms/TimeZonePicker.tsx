import { useMemo } from 'react';
import { Combobox, makeStyles, Option, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { NO_MATCH, useSearchCombobox } from './search-combobox';
import { searchTimeZones, timeZoneOptions, type TimeZoneOption } from './time-zone-options';

const useStyles = makeStyles({
  offset: { color: tokens.colorNeutralForeground3, marginInlineStart: tokens.spacingHorizontalS, fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});

const labelOf = (option: TimeZoneOption) => `${option.zone} (${option.offset})`;

/**
 * A venue's time zone: a search box over every IANA zone the browser knows, each shown with its
 * offset now, answering with the zone's name. Inside a Fluent `Field`, it takes the field's label.
 */
export function TimeZonePicker({ value, onChange, disabled }: { value: string; onChange: (zone: string) => void; disabled?: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const options = useMemo(() => timeZoneOptions(new Date(), value), [value]);
  // query is null while the person is not searching, so the box shows the chosen zone.
  const { query, props: searching } = useSearchCombobox(onChange);
  const found = query === null ? options : searchTimeZones(options, query);
  const chosen = options.find((option) => option.zone === value);
  return (
    <Combobox
      value={query ?? (chosen ? labelOf(chosen) : value)}
      selectedOptions={value ? [value] : []}
      disabled={disabled}
      placeholder={t('settings.timeZonePlaceholder')}
      {...searching}
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
