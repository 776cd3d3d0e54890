import type { WidgetStrings } from './types.js';

export const es: WidgetStrings = {
  caution:
    'Modelo didáctico simplificado. Un curador eligió estos ajustes para mostrar una idea; la roca real se comporta de formas más complicadas.',
  slopeForce: {
    title: 'Caja de fuerzas en la pendiente',
    instructions: 'Arrastre la pendiente hacia arriba o hacia abajo, o use las flechas del teclado, para cambiar su inclinación.',
    angleLabel: 'Ángulo de la pendiente',
    criticalAngle: 'Empieza a deslizar a {{angle}}',
    weight: 'Peso',
    normal: 'Empuja contra la pendiente',
    shear: 'Tira pendiente abajo',
    friction: 'Fricción',
    holds: 'Se sostiene',
    slides: 'Desliza',
    holdsDetail: 'La fricción basta para sujetar el bloque.',
    slidesDetail: 'El tirón pendiente abajo supera lo que la fricción puede sujetar.',
    step: 'Avanzar un paso',
    reset: 'Devolver el bloque a su sitio',
    describeHolds:
      'Un bloque de {{mass}} descansa en una pendiente inclinada {{angle}}. Su peso de {{weight}} empuja contra la pendiente con {{normal}} y tira de él pendiente abajo con {{shear}}. La fricción puede sujetar hasta {{maxFriction}}, así que el bloque se queda quieto. Empezaría a deslizar por encima de {{critical}}.',
    describeSlides:
      'Un bloque de {{mass}} descansa en una pendiente inclinada {{angle}}. Su peso de {{weight}} empuja contra la pendiente con {{normal}} y tira de él pendiente abajo con {{shear}}. La fricción solo puede sujetar {{maxFriction}}, así que el bloque desliza y acelera {{acceleration}}. Empieza a deslizar por encima de {{critical}}.',
  },
  convectionCell: {
    title: 'Celda de convección',
    nusselt: 'Calor transportado (Nu)',
    vrms: 'Velocidad típica (Vrms)',
    time: 'Tiempo',
    timeMyr: 'Tiempo (millones de años)',
    play: 'Reproducir',
    pause: 'Pausa',
    step: 'Avanzar un paso',
    hot: 'Caliente',
    cold: 'Frío',
    estimate: 'estimación',
    speedUnit: 'cm/año',
    millionYears: '{{value}} millones de años',
    describeStill:
      'Una caja de roca del manto, {{aspect}} veces más ancha que profunda, calentada desde abajo y enfriada desde arriba. Su número de Rayleigh es {{rayleigh}}, por debajo del {{onset}} necesario para que empiece la convección, así que el calor solo sube por conducción y la roca se queda quieta.',
    describeConvecting:
      'Una caja de roca del manto, {{aspect}} veces más ancha que profunda, calentada desde abajo y enfriada desde arriba. Su número de Rayleigh es {{rayleigh}}, por encima del {{onset}} necesario para que empiece la convección, así que la roca caliente sube, se enfría arriba y vuelve a hundirse. Transporta unas {{nusselt}} veces más calor del que transportaría la conducción sola (una estimación).',
    describePhysical: 'La caja tiene {{depth}} de profundidad; la roca se mueve a unos {{speed}} y cruza la caja en unos {{transit}}.',
    describeLive: 'Ahora: calor transportado {{nusselt}}, velocidad típica {{vrms}}.',
    overlays: { streamlines: 'Líneas de corriente', particles: 'Partículas a la deriva', arrows: 'Flechas de flujo', none: 'Sin superposición' },
    ramps: { magma: 'Magma', seafloor: 'Fondo marino', greys: 'Grises' },
  },
  states: { holds: 'se sostiene', slides: 'se desliza' },
};
