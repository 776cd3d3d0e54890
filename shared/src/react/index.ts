export { SlopeForceBox, type SlopeForceBoxProps } from './slope-force-box.js';
export { ConvectionCell, type ConvectionCellProps } from './convection-cell.js';
export { SeaFloorDepth, type SeaFloorDepthProps } from './sea-floor-depth.js';
export { PlateForces, type PlateForcesProps } from './plate-forces.js';
export { SimulationCaution } from './simulation-caution.js';
export { useReducedMotion } from './use-reduced-motion.js';
export * from './panel/index.js';
