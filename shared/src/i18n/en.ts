import type { WidgetStrings } from './types.js';

export const en: WidgetStrings = {
  caution:
    'Simplified teaching model. A curator chose these settings to make one point; real rock behaves in more complicated ways.',
  slopeForce: {
    title: 'Slope force box',
    instructions: 'Drag the slope up or down, or use the arrow keys, to change its tilt.',
    angleLabel: 'Slope angle',
    criticalAngle: 'Starts to slide at {{angle}}',
    weight: 'Weight',
    normal: 'Presses into slope',
    shear: 'Pulls down slope',
    friction: 'Friction',
    holds: 'Holds',
    slides: 'Slides',
    holdsDetail: 'Friction is strong enough to hold the block.',
    slidesDetail: 'The pull down the slope is more than friction can hold.',
    step: 'Step forward',
    reset: 'Put the block back',
    describeHolds:
      'A block of {{mass}} rests on a slope tilted at {{angle}}. Its weight of {{weight}} presses into the slope with {{normal}} and pulls it down the slope with {{shear}}. Friction can hold up to {{maxFriction}}, so the block holds still. It would start to slide above {{critical}}.',
    describeSlides:
      'A block of {{mass}} rests on a slope tilted at {{angle}}. Its weight of {{weight}} presses into the slope with {{normal}} and pulls it down the slope with {{shear}}. Friction can hold only {{maxFriction}}, so the block slides, speeding up by {{acceleration}}. It starts to slide above {{critical}}.',
  },
  convectionCell: {
    title: 'Convection cell',
    nusselt: 'Heat carried (Nu)',
    vrms: 'Typical speed (Vrms)',
    time: 'Time',
    timeMyr: 'Time (million years)',
    play: 'Play',
    pause: 'Pause',
    step: 'Step forward',
    hot: 'Hot',
    cold: 'Cold',
    estimate: 'estimate',
    speedUnit: 'cm/yr',
    millionYears: '{{value}} million years',
    describeStill:
      'A box of mantle rock, {{aspect}} times as wide as it is deep, heated from below and cooled from above. Its Rayleigh number is {{rayleigh}}, below the {{onset}} needed to start convection, so heat only conducts upwards and the rock stays still.',
    describeConvecting:
      'A box of mantle rock, {{aspect}} times as wide as it is deep, heated from below and cooled from above. Its Rayleigh number is {{rayleigh}}, above the {{onset}} needed to start convection, so hot rock rises, cools at the top and sinks again. It carries roughly {{nusselt}} times as much heat as conduction alone would (an estimate).',
    describePhysical: 'The box is {{depth}} deep; the rock moves at roughly {{speed}} and crosses the box in about {{transit}}.',
    describeLive: 'Now: heat carried {{nusselt}}, typical speed {{vrms}}.',
    overlays: { streamlines: 'Streamlines', particles: 'Drifting particles', arrows: 'Flow arrows', none: 'No overlay' },
    ramps: { magma: 'Magma', seafloor: 'Sea floor', greys: 'Greys' },
  },
  states: { holds: 'holds', slides: 'slides' },
};
