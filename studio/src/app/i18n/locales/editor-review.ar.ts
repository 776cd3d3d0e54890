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
  widgetTrial: {
    trying: 'تجربة: الإعداد المحفوظ لم يتغيّر. القيم الحية في النص تعرض التجربة، محاطة بخط متقطع.',
    keep: 'اعتمد هذا إعدادًا أوّليًا',
    reset: 'عد إلى الإعداد المحفوظ',
    trialValue: 'تعرض الأداة قيد التجربة، لا إعدادها المحفوظ.',
  },
  stationPreview: {
    open: 'الحجم الكامل',
    title: 'اللوحة {{number}} بالحجم الكامل',
    screen: 'شاشة المحطة',
    screenSize: '{{width}} × {{height}} {{orientation}}',
    screenStations: '{{width}} × {{height}} {{orientation}} · {{stations}}',
    landscape: 'أفقية',
    portrait: 'عمودية',
    fit: 'ملاءمة النافذة',
    actual: 'الحجم الفعلي',
    zoom: 'معروضة بنسبة {{percent}} ٪ من حجم المحطة',
    selected: 'محدّد للتعليق: «{{quote}}»',
    commentOnSelection: 'اكتب التعليق',
  },
};
