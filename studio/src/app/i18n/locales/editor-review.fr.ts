import type { editorReviewEn } from './editor-review.en';

export const editorReviewFr: typeof editorReviewEn = {
  draftComments: {
    tab: 'Commentaires ({{open}})',
    title: 'Commentaires de relecture ouverts',
    summary: 'Ouverts sur ce panneau : {{panel}}. Ouverts dans le récit : {{story}}. Révision {{number}}.',
    none: 'Aucun commentaire ouvert sur ce panneau.',
    noRevision: 'Ce récit n’a pas encore été envoyé en relecture ; il n’a donc aucun commentaire.',
    loadError: 'Les commentaires de relecture n’ont pas pu être chargés.',
  },
  livePhrase: {
    menu: 'Phrase vivante',
    title: 'Phrase vivante',
    intro: 'Des mots qui suivent le widget {{widget}} : la borne affiche la formulation de l’état où il se trouve, et change quand un visiteur le modifie.',
    wordingFor: 'Formulation quand il {{state}}',
    noWidget: 'Son widget n’est plus sur ce panneau, ou n’a pas d’états à suivre. Supprimez la phrase ou remettez le widget.',
  },
  widgetTrial: {
    trying: 'Essai : le réglage enregistré ne change pas. Les valeurs en direct du texte montrent l’essai, encadrées de tirets.',
    keep: 'En faire le réglage de départ',
    reset: 'Revenir au réglage enregistré',
    trialValue: 'Montre le widget à l’essai, pas son réglage enregistré.',
  },
  stationPreview: {
    open: 'Taille réelle',
    title: 'Panneau {{number}} en taille réelle',
    screen: 'Écran de la borne',
    screenSize: '{{width}} × {{height}} {{orientation}}',
    screenStations: '{{width}} × {{height}} {{orientation}} · {{stations}}',
    landscape: 'paysage',
    portrait: 'portrait',
    fit: 'Ajuster à la fenêtre',
    actual: 'Taille réelle',
    zoom: 'Affiché à {{percent}} % de la taille de la borne',
    selected: 'Sélection pour un commentaire : « {{quote}} »',
    commentOnSelection: 'Écrire le commentaire',
  },
};
