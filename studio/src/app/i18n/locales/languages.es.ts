import type { languagesEn } from './languages.en';

export const languagesEs: typeof languagesEn = {
  languagePicker: {
    chosen: 'Idiomas elegidos',
    placeholder: 'Buscar por nombre de idioma o por código',
    noMatch: 'Ningún idioma coincide con «{{query}}».',
    remove: 'Quitar: {{language}}',
  },
};
