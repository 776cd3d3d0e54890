import type { Translated } from '@mantlepiece/shared/kiosk';
import type { KioskMessages } from './en';

export const ar: Translated<KioskMessages> = {
  attract: {
    touch: 'المس الشاشة للبدء',
  },
  notPaired: {
    title: 'القصص في طريقها إلى هنا',
  },
  pairing: {
    codeLabel: 'رمز الاقتران',
    steps: 'للموظفين: في الاستوديو، افتح «المحطات»، ثم محطة هذه الشاشة، وأدخل هذا الرمز هناك.',
    renew: 'حين تنتهي صلاحية الرمز، يظهر هنا رمز جديد تلقائيًا.',
    unreachable: 'تعذّر الوصول إلى الخادم للحصول على رمز اقتران. نحاول مجددًا.',
    unpaired: 'أُلغي اقتران هذه الشاشة في الاستوديو. لاستخدامها مجددًا، اقرنها بالرمز أدناه.',
  },
  waiting: {
    body: 'هذه الشاشة مقترنة وتنتظر أول إصدار لها من الاستوديو.',
    refused: 'رُفض الإصدار {{release}}: ملف لا يطابق القائمة الموقَّعة للإصدار. ستُعاد المحاولة بعد {{time}}، أو فور نشر إصدار جديد.',
  },
  menu: {
    title: 'اختر قصة',
    panels_zero: 'لا شاشات',
    panels_one: 'شاشة واحدة',
    panels_two: 'شاشتان',
    panels_few: '{{count}} شاشات',
    panels_many: '{{count}} شاشة',
    panels_other: '{{count}} شاشة',
  },
  story: {
    previous: 'السابق',
    next: 'التالي',
    allStories: 'كل القصص',
    position: '{{current}} من {{total}}',
  },
  settings: {
    language: 'اللغة',
    largeText: 'نص أكبر',
    highContrast: 'تباين عالٍ',
    reducedMotion: 'حركة أقل',
  },
  idle: {
    title: 'هل ما زلت هنا؟',
    body_zero: 'تعود هذه الشاشة إلى البداية الآن.',
    body_one: 'تعود هذه الشاشة إلى البداية بعد ثانية واحدة.',
    body_two: 'تعود هذه الشاشة إلى البداية بعد ثانيتين.',
    body_few: 'تعود هذه الشاشة إلى البداية بعد {{count}} ثوانٍ.',
    body_many: 'تعود هذه الشاشة إلى البداية بعد {{count}} ثانية.',
    body_other: 'تعود هذه الشاشة إلى البداية بعد {{count}} ثانية.',
    stay: 'ما زلت هنا',
  },
};
