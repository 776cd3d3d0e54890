import type { Translated } from '@mantlepiece/shared/kiosk';
import type { KioskMessages } from './en';

export const es: Translated<KioskMessages> = {
  attract: {
    touch: 'Toque para empezar',
  },
  notPaired: {
    title: 'Las historias están en camino',
  },
  pairing: {
    codeLabel: 'Código de emparejamiento',
    steps: 'Para el personal: en el estudio, abra Puestos, luego el puesto de esta pantalla, e introduzca allí este código.',
    renew: 'Cuando el código caduque, aparecerá aquí uno nuevo automáticamente.',
    unreachable: 'No se puede conectar con el servidor para obtener un código de emparejamiento. Volviendo a intentarlo.',
    unpaired: 'Esta pantalla se desemparejó en el estudio. Para volver a usarla, emparéjela con el código de abajo.',
  },
  waiting: {
    body: 'Esta pantalla está emparejada y espera su primera publicación desde el estudio.',
    refused: 'La publicación {{release}} fue rechazada: un archivo no coincide con la lista firmada de la publicación. Se volverá a intentar después de {{time}}, o en cuanto se publique una nueva.',
  },
  menu: {
    title: 'Elija una historia',
    panels_one: '{{count}} pantalla',
    panels_other: '{{count}} pantallas',
  },
  story: {
    previous: 'Anterior',
    next: 'Siguiente',
    allStories: 'Todas las historias',
    position: '{{current}} de {{total}}',
  },
  settings: {
    language: 'Idioma',
    largeText: 'Texto más grande',
    highContrast: 'Alto contraste',
    reducedMotion: 'Menos movimiento',
  },
  idle: {
    title: '¿Sigue ahí?',
    body_one: 'Esta pantalla vuelve al principio en {{count}} segundo.',
    body_other: 'Esta pantalla vuelve al principio en {{count}} segundos.',
    stay: 'Sigo aquí',
  },
};
