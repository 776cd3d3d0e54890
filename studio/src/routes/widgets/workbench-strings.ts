import { asUiLanguage, type UiLanguage } from '@mantlepiece/shared';

/** The workbench page's own words; the widgets' words come from @mantlepiece/shared's widget resources. */
const english = {
  nav: 'Widget workbench',
  title: 'Widget workbench',
  intro: 'Try a widget’s settings before putting it on a panel. The same checks run here as on the server when a panel is saved.',
  widget: 'Widget',
  settings: 'Settings',
  widgetLanguage: 'Widget text language',
  preview: 'Preview',
  description: 'What a screen reader says',
  computed: 'Computed from these settings',
  warnings: 'Outside the range where the model holds',
  invalid: 'These settings are not valid yet; the preview shows the last valid ones.',
  set: 'Set',
  loading: 'Loading widget types…',
  failed: 'The widget types could not be loaded.',
};

export type WorkbenchStrings = typeof english;

const strings = {
  en: english,
  fr: {
    nav: 'Atelier des widgets',
    title: 'Atelier des widgets',
    intro: 'Essayez les réglages d’un widget avant de le placer sur un panneau. Les mêmes vérifications s’appliquent ici et sur le serveur à l’enregistrement d’un panneau.',
    widget: 'Widget',
    settings: 'Réglages',
    widgetLanguage: 'Langue du texte du widget',
    preview: 'Aperçu',
    description: 'Ce que lit un lecteur d’écran',
    computed: 'Calculé à partir de ces réglages',
    warnings: 'Hors du domaine de validité du modèle',
    invalid: 'Ces réglages ne sont pas encore valides ; l’aperçu montre les derniers réglages valides.',
    set: 'Définir',
    loading: 'Chargement des types de widgets…',
    failed: 'Les types de widgets n’ont pas pu être chargés.',
  },
  es: {
    nav: 'Banco de pruebas de widgets',
    title: 'Banco de pruebas de widgets',
    intro: 'Pruebe los ajustes de un widget antes de ponerlo en un panel. Aquí se hacen las mismas comprobaciones que en el servidor al guardar un panel.',
    widget: 'Widget',
    settings: 'Ajustes',
    widgetLanguage: 'Idioma del texto del widget',
    preview: 'Vista previa',
    description: 'Lo que dice un lector de pantalla',
    computed: 'Calculado a partir de estos ajustes',
    warnings: 'Fuera del rango en el que vale el modelo',
    invalid: 'Estos ajustes aún no son válidos; la vista previa muestra los últimos válidos.',
    set: 'Definir',
    loading: 'Cargando los tipos de widget…',
    failed: 'No se pudieron cargar los tipos de widget.',
  },
  ar: {
    nav: 'منصة تجربة الأدوات',
    title: 'منصة تجربة الأدوات',
    intro: 'جرّب إعدادات الأداة قبل وضعها في لوحة. تُجرى هنا الفحوص نفسها التي يجريها الخادم عند حفظ اللوحة.',
    widget: 'الأداة',
    settings: 'الإعدادات',
    widgetLanguage: 'لغة نص الأداة',
    preview: 'معاينة',
    description: 'ما يقوله قارئ الشاشة',
    computed: 'محسوب من هذه الإعدادات',
    warnings: 'خارج النطاق الذي يصح فيه النموذج',
    invalid: 'هذه الإعدادات غير صالحة بعد؛ تعرض المعاينة آخر إعدادات صالحة.',
    set: 'اضبط',
    loading: 'جارٍ تحميل أنواع الأدوات…',
    failed: 'تعذّر تحميل أنواع الأدوات.',
  },
} satisfies Record<UiLanguage, WorkbenchStrings>;

export const workbenchStrings = (language: string | undefined): WorkbenchStrings => strings[asUiLanguage(language)];
