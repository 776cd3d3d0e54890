import { matchUiLanguage } from '../../app/i18n';

/** The workbench page's own words; the widgets' words come from @mantlepiece/shared's widget resources. */
const strings = {
  en: {
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
  },
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
} satisfies Record<string, Record<string, string>>;

export type WorkbenchStrings = (typeof strings)['en'];

export const workbenchStrings = (language: string | undefined): WorkbenchStrings => strings[matchUiLanguage([language]) ?? 'en'];
