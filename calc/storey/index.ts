/**
 * The storey model of a surveyed building and its demand: storey masses, wall-based lateral
 * stiffness and strength (SDPWS per-length values, user values, CLT connectors), modes,
 * the period used, base and storey shears, roof displacement, drift ratios,
 * demand-to-capacity, ASCE 7-16 soft/weak-storey flags and torsional eccentricity.
 * Entry point: {@link buildingResponse}.
 */
export { buildingResponse } from './building-response.js';
export type { BuildingResponse, DirectionResponse } from './building-response.js';
export type { Assumption, MissingInput } from './findings.js';
export type { PeriodEstimate, PeriodKind } from './period-estimate.js';
export { elfDemand, elfExponent, modalDemand } from './seismic-demand.js';
export type { SeismicDemand } from './seismic-demand.js';
export { storeyIrregularities } from './storey-irregularity.js';
export type { StoreyIrregularity } from './storey-irregularity.js';
export type { StoreyLateral } from './storey-lateral.js';
export { storeyMasses } from './storey-masses.js';
export type { StoreyMass } from './storey-masses.js';
export { torsionalEccentricity } from './torsional-eccentricity.js';
export { FLOOR_UNIT_WEIGHTS, ROOF_UNIT_WEIGHTS } from './unit-weights.js';
export type { UnitWeightDefault } from './unit-weights.js';
export { KIP_PER_IN_TO_N_PER_M, PLF_TO_N_PER_M, WALL_UNIT_VALUES } from './wall-unit-values.js';
export type { WallUnitValues } from './wall-unit-values.js';
export { wallContribution } from './wall-contribution.js';
export type { WallContribution, WallTreatment } from './wall-contribution.js';
export { CLT_TYPICAL, cltWallResistance } from './clt-connectors.js';
export type { CltConnectors } from './clt-connectors.js';
export { Findings } from './findings.js';
export { storeyName } from './storey-name.js';
