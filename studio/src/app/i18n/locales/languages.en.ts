/** The language picker's words (components/forms/LanguagePicker.tsx). */
export const languagesEn = {
  languagePicker: {
    chosen: 'Chosen languages',
    placeholder: 'Search by language name or tag',
    noMatch: 'No language matches “{{query}}”.',
    remove: 'Remove {{language}}',
  },
};
