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
  /** A widget's state as a live value shows it inside a sentence ("the block {{state}}"), so in lower case. */
  states: Readonly<Record<WidgetState, string>>;
}

export interface WidgetResource {
  widgets: WidgetStrings;
}
