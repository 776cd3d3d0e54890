import type { editorReviewEn } from './editor-review.en';

export const editorReviewEs: typeof editorReviewEn = {
  draftComments: {
    tab: 'Comentarios ({{open}})',
    title: 'Comentarios de revisión abiertos',
    summary: 'Abiertos en este panel: {{panel}}. Abiertos en la historia: {{story}}. Revisión {{number}}.',
    none: 'No hay comentarios abiertos en este panel.',
    noRevision: 'Esta historia aún no se ha enviado a revisión, así que no tiene comentarios.',
    loadError: 'No se pudieron cargar los comentarios de revisión.',
  },
  livePhrase: {
    menu: 'Frase viva',
    title: 'Frase viva',
    intro: 'Palabras que siguen al widget {{widget}}: el quiosco muestra el texto del estado en que está y cambia cuando un visitante lo modifica.',
    wordingFor: 'Texto mientras {{state}}',
    noWidget: 'Su widget ya no está en este panel o no tiene estados que seguir. Quite la frase o vuelva a añadir el widget.',
  },
  widgetTrial: {
    trying: 'De prueba: el ajuste guardado no cambia. Los valores en vivo del texto muestran la prueba, con borde de guiones.',
    keep: 'Usar esto como ajuste inicial',
    reset: 'Volver al ajuste guardado',
    trialValue: 'Muestra el widget en prueba, no su ajuste guardado.',
  },
  stationPreview: {
    open: 'Tamaño real',
    title: 'Panel {{number}} a tamaño real',
    screen: 'Pantalla del puesto',
    screenSize: '{{width}} × {{height}} {{orientation}}',
    screenStations: '{{width}} × {{height}} {{orientation}} · {{stations}}',
    landscape: 'horizontal',
    portrait: 'vertical',
    fit: 'Ajustar a la ventana',
    actual: 'Tamaño real',
    zoom: 'Mostrado al {{percent}} % del tamaño del puesto',
    selected: 'Seleccionado para un comentario: «{{quote}}»',
    commentOnSelection: 'Escribir el comentario',
  },
};
