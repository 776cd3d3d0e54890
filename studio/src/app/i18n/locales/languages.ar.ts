import type { languagesEn } from './languages.en';

export const languagesAr: typeof languagesEn = {
  languagePicker: {
    chosen: 'اللغات المختارة',
    placeholder: 'ابحث باسم اللغة أو برمزها',
    noMatch: 'لا توجد لغة تطابق «{{query}}».',
    remove: 'إزالة {{language}}',
  },
};
