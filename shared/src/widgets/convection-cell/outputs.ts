import type { SimulationReport, WidgetOutput } from '../types.js';
import { physicalScales, type ConvectionCellDerived } from './derived.js';
import type { ConvectionCellParams } from './params.js';

type Output = WidgetOutput<ConvectionCellParams, ConvectionCellDerived>;

/** What the running solver reports with each frame, in its non-dimensional units. */
export type ConvectionReport = { time: number; nusselt: number; vrms: number };

const reported = (report: SimulationReport, key: keyof ConvectionReport) => report[key] ?? Number.NaN;
const hasPhysical = (params: ConvectionCellParams) => params.physical !== undefined;

/**
 * What the convection cell puts out. Ra and its onset follow from the settings; heat carried (Nu),
 * speed (Vrms) and elapsed time come from the running solver, so a caption quotes what the visitor
 * watches rather than a scaling estimate. In physical units the speed is Vrms·κ/d and the time t·d²/κ.
 */
export const convectionCellOutputs: readonly Output[] = [
  { name: 'rayleigh', kind: 'number', unit: '', source: 'settings', read: (derived) => derived.rayleigh },
  { name: 'onsetRayleigh', kind: 'number', unit: '', source: 'settings', read: (derived) => derived.onsetRayleigh },
  { name: 'onsetRayleighInfiniteLayer', kind: 'number', unit: '', source: 'settings', read: (derived) => derived.onsetRayleighInfiniteLayer },
  { name: 'nusselt', kind: 'number', unit: '', source: 'simulation', read: (report) => reported(report, 'nusselt') },
  { name: 'vrms', kind: 'number', unit: '', source: 'simulation', read: (report) => reported(report, 'vrms') },
  {
    name: 'speedCmYr',
    kind: 'number',
    unit: 'cm/yr',
    source: 'simulation',
    appliesTo: hasPhysical,
    read: (report, params) => reported(report, 'vrms') * physicalScales(params.physical!).velocityScaleCmYr,
  },
  {
    name: 'elapsedMyr',
    kind: 'number',
    unit: 'Myr',
    source: 'simulation',
    appliesTo: hasPhysical,
    read: (report, params) => reported(report, 'time') * physicalScales(params.physical!).timeScaleMyr,
  },
];
