import { useMemo, useState, type ReactNode } from 'react';
import {
  Combobox, makeStyles, Option, Tag, TagPicker, TagPickerControl, TagPickerGroup, TagPickerInput, TagPickerList, TagPickerOption, tokens,
} from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { languageOption, languageOptions, searchLanguages, type LanguageOption } from './language-options';
import { NO_MATCH, useSearchCombobox } from './search-combobox';

const useStyles = makeStyles({
  tag: { color: tokens.colorNeutralForeground3, marginInlineStart: tokens.spacingHorizontalS, fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});

interface CommonProps {
  /** Tags to offer beside the common languages, such as those the venue already uses. */
  offered?: readonly string[];
  disabled?: boolean;
  placeholder?: string;
  'aria-label'?: string;
  'aria-labelledby'?: string;
}

interface SinglePickerProps extends CommonProps {
  multiple?: false;
  /** A canonical BCP 47 tag, or '' while none is chosen. */
  value: string;
  onChange: (tag: string) => void;
}

interface MultiplePickerProps extends CommonProps {
  multiple: true;
  /** Canonical BCP 47 tags in the order chosen. */
  value: readonly string[];
  onChange: (tags: string[]) => void;
}

export type LanguagePickerProps = SinglePickerProps | MultiplePickerProps;

/**
 * Every field that takes a language: a search box that finds languages by their name in the
 * studio's language, by their own name or by tag, and answers with the canonical BCP 47 tag.
 * One language (a story's "Written in") or several (a venue's target locales). Inside a Fluent
 * `Field`, it takes the field's label.
 */
export function LanguagePicker(props: LanguagePickerProps) {
  const { t, i18n } = useTranslation();
  const uiLanguage = i18n.resolvedLanguage ?? 'en';
  // Keyed by content: the arrays are fresh on every render of the form.
  const inUse = [...(props.offered ?? []), ...(props.multiple ? props.value : props.value ? [props.value] : [])].join(' ');
  const options = useMemo(() => languageOptions(uiLanguage, inUse.split(' ').filter(Boolean)), [uiLanguage, inUse]);
  const optionOf = (tag: string): LanguageOption => options.find((option) => option.tag === tag) ?? languageOption(tag, uiLanguage) ?? { tag, name: tag, endonym: tag };
  const labelOf = (option: LanguageOption) => (option.name === option.tag ? option.tag : `${option.name} (${option.tag})`);
  return props.multiple
    ? <MultipleLanguagePicker {...props} options={options} optionOf={optionOf} labelOf={labelOf} uiLanguage={uiLanguage} noMatch={(query) => t('languagePicker.noMatch', { query })} removeLabel={(language) => t('languagePicker.remove', { language })} chosenLabel={t('languagePicker.chosen')} placeholder={props.placeholder ?? t('languagePicker.placeholder')} />
    : <SingleLanguagePicker {...props} options={options} optionOf={optionOf} labelOf={labelOf} uiLanguage={uiLanguage} noMatch={(query) => t('languagePicker.noMatch', { query })} placeholder={props.placeholder ?? t('languagePicker.placeholder')} />;
}

interface Internals {
  options: LanguageOption[];
  optionOf: (tag: string) => LanguageOption;
  labelOf: (option: LanguageOption) => string;
  uiLanguage: string;
  noMatch: (query: string) => string;
  placeholder: string;
}

function OptionContent({ option }: { option: LanguageOption }): ReactNode {
  const styles = useStyles();
  return (
    <>
      {option.name}
      {option.name === option.tag ? null : <>{' '}<span className={styles.tag}>{option.tag}</span></>}
    </>
  );
}

function SingleLanguagePicker({ value, onChange, disabled, options, optionOf, labelOf, uiLanguage, noMatch, placeholder, ...aria }: SinglePickerProps & Internals) {
  // query is null while the person is not searching, so the box shows the chosen language's name.
  const { query, props: searching } = useSearchCombobox(onChange);
  const found = query === null ? options : searchLanguages(options, query, uiLanguage);
  return (
    <Combobox
      value={query ?? (value ? labelOf(optionOf(value)) : '')}
      selectedOptions={value ? [value] : []}
      disabled={disabled}
      placeholder={placeholder}
      aria-label={aria['aria-label']}
      aria-labelledby={aria['aria-labelledby']}
      {...searching}
    >
      {found.length === 0
        ? <Option key="no-match" value={NO_MATCH} text="" disabled>{noMatch(query ?? '')}</Option>
        : found.map((option) => <Option key={option.tag} value={option.tag} text={labelOf(option)}><OptionContent option={option} /></Option>)}
    </Combobox>
  );
}

function MultipleLanguagePicker({ value, onChange, disabled, options, optionOf, labelOf, uiLanguage, noMatch, placeholder, removeLabel, chosenLabel, ...aria }: MultiplePickerProps & Internals & { removeLabel: (language: string) => string; chosenLabel: string }) {
  const [query, setQuery] = useState('');
  const [open, setOpen] = useState(false);
  const found = searchLanguages(options, query, uiLanguage).filter((option) => !value.includes(option.tag));
  return (
    <TagPicker
      selectedOptions={[...value]}
      disabled={disabled}
      open={open}
      onOpenChange={(_event, data) => setOpen(data.open)}
      onOptionSelect={(_event, data) => {
        if (data.value === NO_MATCH) return;
        onChange(data.selectedOptions);
        setQuery('');
      }}
    >
      <TagPickerControl>
        <TagPickerGroup aria-label={chosenLabel}>
          {value.map((tag) => {
            const option = optionOf(tag);
            return (
              <Tag key={tag} value={tag} shape="rounded" title={option.tag} dismissIcon={{ 'aria-label': removeLabel(option.name) }}>
                {option.name}
              </Tag>
            );
          })}
        </TagPickerGroup>
        <TagPickerInput
          value={query}
          placeholder={value.length === 0 ? placeholder : undefined}
          aria-label={aria['aria-label']}
          aria-labelledby={aria['aria-labelledby']}
          // Text typed through an input method (Arabic, say) opens the list too, not only key presses.
          onChange={(event) => { setQuery(event.target.value); setOpen(true); }}
        />
      </TagPickerControl>
      <TagPickerList>
        {found.length === 0
          ? <TagPickerOption key="no-match" value={NO_MATCH} text="">{noMatch(query)}</TagPickerOption>
          : found.map((option) => <TagPickerOption key={option.tag} value={option.tag} text={labelOf(option)}><OptionContent option={option} /></TagPickerOption>)}
      </TagPickerList>
    </TagPicker>
  );
}
