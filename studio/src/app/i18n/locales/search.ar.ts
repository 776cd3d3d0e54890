import type { searchEn } from './search.en';

export const searchAr: typeof searchEn = {
  search: {
    label: 'البحث في القصص والوسائط والأشخاص',
    placeholder: 'بحث',
    tooShort: 'اكتب {{min}} أحرف على الأقل.',
    failed: 'تعذّر إجراء البحث. حاول مرة أخرى.',
    nothing: 'لم يُعثر على شيء لـ «{{q}}».',
    all: 'كل النتائج في {{kind}}',
    kinds: { stories: 'القصص', media: 'الوسائط', people: 'الأشخاص' },
  },
};
