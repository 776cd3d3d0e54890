import type { editorReviewEn } from './editor-review.en';

export const editorReviewAr: typeof editorReviewEn = {
  draftComments: {
    tab: 'التعليقات ({{open}})',
    title: 'تعليقات المراجعة المفتوحة',
    summary: 'المفتوحة في هذه اللوحة: {{panel}}. المفتوحة في القصة: {{story}}. من المراجعة {{number}}.',
    none: 'لا توجد تعليقات مفتوحة في هذه اللوحة.',
    noRevision: 'لم تُرسل هذه القصة للمراجعة بعد، لذا لا تعليقات عليها.',
    loadError: 'تعذّر تحميل تعليقات المراجعة.',
  },
  livePhrase: {
    menu: 'عبارة حيّة',
    title: 'عبارة حيّة',
    intro: 'كلمات تتبع الأداة {{widget}}: يعرض الكشك الصياغة الخاصة بحالتها، ويبدّلها عندما يغيّرها الزائر.',
    wordingFor: 'الصياغة عندما يكون {{state}}',
    noWidget: 'لم تعد أداتها في هذه اللوحة، أو ليست لها حالات تتبعها. احذف العبارة أو أعد الأداة.',
  },
};
