import type { shortcutsEn } from './shortcuts.en';

export const shortcutsAr: typeof shortcutsEn = {
  shortcuts: {
    open: 'اختصارات لوحة المفاتيح',
    title: 'اختصارات لوحة المفاتيح',
    groups: { anywhere: 'في أي مكان', text: 'نص اللوحة', panels: 'قائمة اللوحات', drawings: 'رسم الأداة', translation: 'مساحة الترجمة' },
    does: {
      sheet: 'عرض هذه القائمة',
      bold: 'عريض',
      italic: 'مائل',
      undo: 'تراجع',
      redo: 'إعادة',
      panelEdges: 'انتقل إلى بداية اللوحة أو نهايتها، قبل أداة تبدأ بها',
      movePanel: 'نقل اللوحة المختارة إلى الأمام أو الخلف',
      change: 'تغيير القيمة التي يضبطها الرسم (الميل، العمر، الطول)',
      fineChange: 'تغييرها بخطوات صغيرة',
      bigChange: 'تغييرها بخطوات كبيرة',
      ends: 'الانتقال إلى أصغر قيمة أو أكبرها',
      saveNext: 'حفظ الترجمة والانتقال إلى الوحدة التالية',
      otherUnit: 'الانتقال إلى الوحدة السابقة أو التالية',
    },
  },
};
