import type { WidgetState } from '../widgets/types.js';

/**
 * Every piece of widget text a visitor or a curator reads. Each locale file is typed by this, so a
 * new language (es, ar, …) cannot leave a string out. Templates use i18next's {{name}} placeholders,
 * so studio and kiosk can also load these objects into their own i18next instance under the
 * `widgets` namespace.
 */
export interface WidgetStrings {
  caution: string;
  slopeForce: {
    title: string;
    instructions: string;
    /** The same for a touchscreen, where there are no arrow keys. */
    instructionsTouch: string;
    angleLabel: string;
    criticalAngle: string;
    weight: string;
    normal: string;
    shear: string;
    friction: string;
    holds: string;
    slides: string;
    holdsDetail: string;
    slidesDetail: string;
    step: string;
    reset: string;
    describeHolds: string;
    describeSlides: string;
  };
  convectionCell: {
    title: string;
    nusselt: string;
    vrms: string;
    time: string;
    timeMyr: string;
    play: string;
    pause: string;
    step: string;
    hot: string;
    cold: string;
    estimate: string;
    speedUnit: string;
    millionYears: string;
    describeStill: string;
    describeConvecting: string;
    describePhysical: string;
    describeLive: string;
    overlays: { streamlines: string; particles: string; arrows: string; none: string };
    ramps: { magma: string; seafloor: string; greys: string };
  };
  /** A widget's model card as visitors open it on the kiosk. */
  modelCard: {
    open: string;
    equations: string;
    assumptions: string;
    range: string;
    sources: string;
  };
  seaFloorDepth: {
    title: string;
    instructions: string;
    /** The same for a touchscreen, where there are no arrow keys. */
    instructionsTouch: string;
    ageLabel: string;
    older: string;
    younger: string;
    modelLabel: string;
    halfSpace: string;
    plate: string;
    ridge: string;
    seaLevel: string;
    depth: string;
    heatFlow: string;
    thickness: string;
    describe: string;
  };
  plateForces: {
    title: string;
    instructions: string;
    ageLabel: string;
    slabLengthLabel: string;
    more: string;
    less: string;
    ridgePush: string;
    slabPull: string;
    perMetre: string;
    ridge: string;
    trench: string;
    resistance: string;
    caution: string;
    slabPullDominates: string;
    ridgePushDominates: string;
    ratio: string;
    describe: string;
  };
  /**
   * The name of each setting a curator sets in the studio, by widget and param path ("physical.viscosityPas"),
   * with the symbol the model card uses; units stay out (the form shows the schema's own beside the field).
   */
  settings: {
    'slope-force': Readonly<Record<'massKg' | 'angleDeg' | 'staticFriction' | 'kineticFriction' | 'gravity', string>>;
    'convection-cell': Readonly<Record<
      | 'rayleigh' | 'physical' | 'physical.densityKgM3' | 'physical.gravityMs2' | 'physical.expansivityPerK' | 'physical.deltaTK'
      | 'physical.depthM' | 'physical.diffusivityM2s' | 'physical.viscosityPas' | 'aspectRatio' | 'nx' | 'nz' | 'playbackSpeed'
      | 'colourRamp' | 'overlay' | 'units',
      string
    >>;
    'sea-floor-depth': Readonly<Record<
      'ageMyr' | 'model' | 'mantleDensityKgM3' | 'waterDensityKgM3' | 'expansivityPerK' | 'deltaTK' | 'diffusivityM2s' | 'ridgeDepthM' | 'conductivityWmK',
      string
    >>;
    'plate-forces': Readonly<Record<
      'ageMyr' | 'slabLengthKm' | 'slabDipDeg' | 'mantleDensityKgM3' | 'waterDensityKgM3' | 'expansivityPerK' | 'deltaTK' | 'diffusivityM2s' | 'gravityMs2',
      string
    >>;
  };
  /** The name of each choice a setting offers, by widget, param and value. */
  choices: {
    'convection-cell': {
      colourRamp: Readonly<Record<'mantle-heat' | 'deep-sea' | 'basalt-greys', string>>;
      overlay: Readonly<Record<'streamlines' | 'particles' | 'arrows' | 'none', string>>;
      units: Readonly<Record<'non-dimensional' | 'physical', string>>;
    };
    'sea-floor-depth': { model: Readonly<Record<'half-space' | 'plate', string>> };
  };
  /** A widget's state as a live value shows it inside a sentence ("the block {{state}}"), so in lower case. */
  states: Readonly<Record<WidgetState, string>>;
}

export interface WidgetResource {
  widgets: WidgetStrings;
}
