/**
 * Every sentence the survey schema and the storage layer show to a person, in one place.
 *
 * A catalogue has four parts:
 * - `fields`: a label and SI unit for each field, keyed by path pattern (dot-separated,
 *   list indices replaced by `*`, e.g. `building.storeys.*.heightM`);
 * - `rules`: sentence templates for each kind of validation failure (they receive the label,
 *   the unit and the limit, so "Storey height must be more than 0 m." is built, not stored);
 * - `gaps`: what is still missing before a record can be screened;
 * - `storage`: what happened to a save, and what the inspector should do.
 *
 * The UI catalogue imports this module; a second language is another object of type
 * `MessageCatalogue` registered in `catalogues`. Units in messages are the stored SI units.
 */

/** A field's name as shown to the inspector, and its unit (empty when it has none). */
export interface FieldLabel {
  label: string;
  unit: string;
  /** Said after a limit, e.g. "(a ratio: 0.01 = 1 %)". */
  hint?: string;
}

/** What a rule template receives. */
export interface RuleInput {
  label: string;
  unit: string;
  hint: string;
}

export interface RuleMessages {
  moreThan(f: RuleInput, limit: number): string;
  atLeast(f: RuleInput, limit: number): string;
  lessThan(f: RuleInput, limit: number): string;
  atMost(f: RuleInput, limit: number): string;
  textTooLong(f: RuleInput, limit: number): string;
  textEmpty(f: RuleInput): string;
  tooManyEntries(f: RuleInput, limit: number): string;
  tooFewEntries(f: RuleInput, limit: number): string;
  wholeNumber(f: RuleInput): string;
  number(f: RuleInput): string;
  text(f: RuleInput): string;
  yesNo(f: RuleInput): string;
  list(f: RuleInput): string;
  missing(f: RuleInput): string;
  choice(f: RuleInput): string;
  format(f: RuleInput, format: string): string;
  unexpectedFields(f: RuleInput, keys: readonly string[]): string;
  notJson(f: RuleInput): string;
  invalid(f: RuleInput): string;
}

export interface GapMessages {
  noStoreys: string;
  noWalls(storeyNumber: number, direction: string): string;
  noHazard: string;
  wallOnMissingStorey(wallId: string, storeyNumber: number): string;
  duplicateWallId(wallId: string): string;
  upliftUnknownWall(wallId: string): string;
  driftOnMissingStorey(storeyNumber: number): string;
  cornerPeriodsOrder: string;
  unconfirmed(label: string): string;
  unparsed(label: string, text: string): string;
}

export interface StorageMessages {
  quota: string;
  connectionLost: string;
  reloadRequired: string;
  upgradeBlocked: string;
  evictionRisk: string;
  notPersisted: string;
  invalidDraft: string;
  notFound: string;
  conflict: string;
  updatedElsewhere: string;
  openElsewhere: string;
  unknown(detail: string): string;
  quarantined(count: number): string;
  photoUnreadable: string;
  damagedRow: string;
  invalidBatch(count: number): string;
  /** Button: save the records kept apart as a file. */
  exportQuarantined: string;
  /** Button: hide a storage notice for now. */
  hideNotice: string;
  /** Button: reload this tab. */
  reloadNow: string;
  /** Said when the records kept apart could not be exported. */
  exportQuarantinedFailed(detail: string): string;
}

export interface MessageCatalogue {
  /** BCP 47 language tag. */
  lang: string;
  fields: Record<string, FieldLabel>;
  /** Label used when no pattern matches (never shown for the app's own fields). */
  fallbackField: FieldLabel;
  rules: RuleMessages;
  gaps: GapMessages;
  storage: StorageMessages;
  /** How a direction and a storey are named in sentences. */
  direction(d: 'x' | 'y'): string;
}

const withUnit = (value: number, f: RuleInput): string =>
  `${value}${f.unit ? ` ${f.unit}` : ''}${f.hint ? ` ${f.hint}` : ''}`;

const f = (label: string, unit = '', hint?: string): FieldLabel =>
  hint === undefined ? { label, unit } : { label, unit, hint };

const RATIO_HINT = '(a ratio: 0.01 = 1 %)';

/** English. */
export const en: MessageCatalogue = {
  lang: 'en',
  fallbackField: f('This value'),
  fields: {
    '': f('The record'),
    schemaVersion: f('Record format version'),
    id: f('Record identifier'),
    revision: f('Revision number'),
    deviceId: f('Device identifier'),
    createdAt: f('Creation time'),
    updatedAt: f('Time of the last change'),
    address: f('Address or description'),
    location: f('Location'),
    'location.lat': f('Latitude', '°'),
    'location.lon': f('Longitude', '°'),
    'location.accuracyM': f('Location accuracy', 'm'),
    'location.source': f('How the location was found'),
    inspector: f('Inspector'),
    team: f('Team'),
    inspectionKind: f('Kind of inspection'),
    building: f('Building'),
    'building.system': f('Structural system'),
    'building.codeLevel': f('Code era'),
    'building.occupancy': f('Occupancy'),
    'building.planXM': f('Plan length along x', 'm'),
    'building.planYM': f('Plan length along y', 'm'),
    'building.storeys': f('Storeys'),
    'building.storeys.*': f('Storey'),
    'building.storeys.*.heightM': f('Storey height', 'm'),
    'building.storeys.*.floorAreaM2': f('Floor area', 'm²'),
    'building.storeys.*.floorConstruction': f('Floor construction'),
    'building.storeys.*.unitWeightPa': f('Floor unit weight', 'Pa'),
    'building.roofConstruction': f('Roof construction'),
    'building.roofUnitWeightPa': f('Roof unit weight', 'Pa'),
    walls: f('Walls'),
    'walls.*': f('Wall'),
    'walls.*.id': f('Wall identifier'),
    'walls.*.storey': f('Storey of the wall'),
    'walls.*.direction': f('Wall direction'),
    'walls.*.type': f('Wall type'),
    'walls.*.lengthM': f('Wall length', 'm'),
    'walls.*.heightM': f('Wall height', 'm'),
    'walls.*.positionM': f('Wall position', 'm'),
    'walls.*.connectors': f('Connectors'),
    'walls.*.connectors.holdDownCount': f('Number of hold-downs'),
    'walls.*.connectors.holdDownCapacityN': f('Hold-down capacity', 'N'),
    'walls.*.connectors.holdDownStiffnessNPerM': f('Hold-down stiffness', 'N/m'),
    'walls.*.connectors.bracketCount': f('Number of angle brackets'),
    'walls.*.connectors.bracketCapacityN': f('Angle bracket capacity', 'N'),
    'walls.*.connectors.bracketStiffnessNPerM': f('Angle bracket stiffness', 'N/m'),
    'walls.*.rocking': f('Rocking details'),
    'walls.*.rocking.thicknessM': f('Wall thickness', 'm'),
    'walls.*.rocking.selfWeightN': f('Wall self weight', 'N'),
    'walls.*.rocking.gravityLoadN': f('Gravity load on the wall', 'N'),
    'walls.*.rocking.postTensionN': f('Post-tension force', 'N'),
    'walls.*.devices': f('Supplemental devices'),
    'walls.*.devices.*': f('Supplemental device'),
    'walls.*.userUnitShearNPerM': f('Unit shear strength', 'N/m'),
    'walls.*.userUnitStiffnessNPerM2': f('Unit shear stiffness', 'N/m per m'),
    observations: f('Observations'),
    'observations.uplift': f('Uplift readings'),
    'observations.uplift.*.wallId': f('Wall of the uplift reading'),
    'observations.uplift.*.gapM': f('Uplift gap', 'm'),
    'observations.residualDrift': f('Residual drift readings'),
    'observations.residualDrift.*.storey': f('Storey of the drift reading'),
    'observations.residualDrift.*.direction': f('Direction of the drift reading'),
    'observations.residualDrift.*.ratio': f('Residual drift', '', RATIO_HINT),
    'observations.residualDrift.*.method': f('How the drift was measured'),
    'observations.residualDrift.*.offsetM': f('Measured offset', 'm'),
    'observations.residualDrift.*.overHeightM': f('Height over which the offset was measured', 'm'),
    'observations.residualDrift.*.tiltRad': f('Measured tilt', 'rad'),
    'observations.residualDrift.*.uncertainty': f('Drift uncertainty', '', RATIO_HINT),
    'observations.checklist': f('Damage checklist'),
    'observations.checklist.*.item': f('Checklist item'),
    'observations.checklist.*.severity': f('Severity'),
    'observations.notes': f('Notes'),
    hazard: f('Hazard'),
    'hazard.kind': f('Kind of spectrum'),
    'hazard.type': f('EC8 spectrum type'),
    'hazard.ground': f('Ground type'),
    'hazard.ag': f('Design ground acceleration', 'g'),
    'hazard.damping': f('Damping', '', RATIO_HINT),
    'hazard.S': f('Soil factor S'),
    'hazard.TB': f('Corner period TB', 's'),
    'hazard.TC': f('Corner period TC', 's'),
    'hazard.TD': f('Corner period TD', 's'),
    'hazard.SDS': f('SDS', 'g'),
    'hazard.SD1': f('SD1', 'g'),
    'hazard.TL': f('Long-period transition TL', 's'),
    'hazard.pga': f('Peak ground acceleration', 'g'),
    'hazard.sa03': f('Spectral acceleration at 0.3 s', 'g'),
    'hazard.sa10': f('Spectral acceleration at 1.0 s', 'g'),
    measured: f('Measured frequency'),
    'measured.frequencyHz': f('Measured frequency', 'Hz'),
    'measured.dampingRatio': f('Measured damping', '', RATIO_HINT),
    'measured.confidence': f('Confidence of the measurement', '', '(0 to 1)'),
    'measured.direction': f('Direction of the measurement'),
    photos: f('Photos'),
    'photos.*.id': f('Photo identifier'),
    'photos.*.takenAt': f('Time the photo was taken'),
    'photos.*.caption': f('Photo caption'),
    'photos.*.keptLocation': f('Keep the photo location'),
    result: f('Screening result'),
    'result.calcVersion': f('Calculation version'),
    'result.computedAt': f('Time of the screening'),
    'result.result': f('Screening result data'),
    lastExportedAt: f('Time of the last export'),
    instrumentRecords: f('Instrument recordings'),
    'instrumentRecords.*.id': f('Recording identifier'),
    'instrumentRecords.*.kind': f('Kind of recording'),
    'instrumentRecords.*.recordedAt': f('Time of the recording'),
    'instrumentRecords.*.data': f('Recording data'),
    unconfirmed: f('List of values to confirm'),
    unparsed: f('Entries not yet valid'),
  },
  rules: {
    moreThan: (x, n) => `${x.label} must be more than ${withUnit(n, x)}.`,
    atLeast: (x, n) => `${x.label} must be at least ${withUnit(n, x)}.`,
    lessThan: (x, n) => `${x.label} must be less than ${withUnit(n, x)}.`,
    atMost: (x, n) => `${x.label} must be at most ${withUnit(n, x)}.`,
    textTooLong: (x, n) => `${x.label} must be at most ${n} characters long.`,
    textEmpty: (x) => `${x.label} must not be empty.`,
    tooManyEntries: (x, n) => `${x.label}: at most ${n} entries are allowed.`,
    tooFewEntries: (x, n) => `${x.label}: at least ${n} entries are needed.`,
    wholeNumber: (x) => `${x.label} must be a whole number.`,
    number: (x) => `${x.label} must be a number${x.unit ? ` in ${x.unit}` : ''}.`,
    text: (x) => `${x.label} must be text.`,
    yesNo: (x) => `${x.label} must be yes or no.`,
    list: (x) => `${x.label} must be a list.`,
    missing: (x) => `${x.label} is missing.`,
    choice: (x) => `${x.label}: choose one of the options offered.`,
    format: (x, format) => {
      const what =
        format === 'uuid'
          ? 'an identifier of the form xxxxxxxx-xxxx-xxxx-xxxx-xxxxxxxxxxxx'
          : format === 'datetime'
            ? 'a date and time in UTC, such as 2024-05-01T14:30:00Z'
            : `in the form "${format}"`;
      return `${x.label} must be ${what}.`;
    },
    unexpectedFields: (x, keys) =>
      `${x.label} holds fields this version of the app does not know: ${keys.join(', ')}.`,
    notJson: (x) =>
      `${x.label} must be plain data (text, finite numbers, yes/no, lists and groups).`,
    invalid: (x) => `${x.label} is not valid.`,
  },
  gaps: {
    noStoreys: 'Add at least one storey.',
    noWalls: (n, d) => `Storey ${n}: add at least one wall along ${d}.`,
    noHazard: 'Choose the hazard: the response spectrum to screen against.',
    wallOnMissingStorey: (id, n) => `Wall ${id} is on storey ${n}, which has not been added.`,
    duplicateWallId: (id) => `Two walls share the identifier ${id}; give each wall its own.`,
    upliftUnknownWall: (id) => `An uplift reading refers to wall ${id}, which is not listed.`,
    driftOnMissingStorey: (n) => `A drift reading refers to storey ${n}, which has not been added.`,
    cornerPeriodsOrder: 'The corner periods must satisfy TB ≤ TC ≤ TD (in s).',
    unconfirmed: (label) => `Confirm ${label.toLowerCase()}: the app filled in this value.`,
    unparsed: (label, text) => `${label}: “${text}” is not a valid value yet.`,
  },
  storage: {
    quota:
      'This device is out of storage space, so the last change was not saved. Export your ' +
      'surveys now, then remove photos you no longer need (or free space on the device) and ' +
      'try again. Nothing already saved has been lost.',
    connectionLost:
      'The connection to the device storage was lost and could not be restored. Your last ' +
      'change is kept on this screen; reload the page to save it.',
    reloadRequired:
      'Grainline was updated in another tab. Your entries so far are saved; reload this tab ' +
      'to keep working.',
    upgradeBlocked:
      'An older Grainline tab is still open. Close it (your entries there are saved) so this ' +
      'tab can finish updating its storage.',
    evictionRisk:
      'This browser may delete saved surveys after some days without use. Install Grainline ' +
      '(add it to the home screen) and export your surveys often.',
    notPersisted:
      'The browser has not granted lasting storage. Export your surveys often so a copy ' +
      'exists off this device.',
    invalidDraft:
      'Some entries are not valid yet, so this version was put aside, not saved as a ' +
      'revision. Fix the fields marked on the form; nothing you typed has been lost.',
    notFound: 'This survey is not on this device.',
    conflict:
      'This survey was changed in another tab or window. Both versions are kept. Choose ' +
      'which one to keep working on.',
    updatedElsewhere: 'This survey was updated in another tab; the newest version is shown.',
    openElsewhere: 'This survey is also open in another tab. Edit it in one place only.',
    unknown: (detail) => `The change could not be saved (${detail}). Try again, or export now.`,
    quarantined: (n) =>
      n === 1
        ? 'One stored record could not be read. It is kept apart, unchanged, and can be exported.'
        : `${n.toLocaleString('en')} stored records could not be read. They are kept apart, unchanged, and can be exported.`,
    photoUnreadable: 'This photo could not be read. Try another photo or take it again.',
    damagedRow:
      'The stored copy is damaged: its envelope is missing or does not match the record inside.',
    invalidBatch: (n) =>
      n === 1
        ? 'One record is not valid, so none of them were written.'
        : `${n} records are not valid, so none of them were written.`,
    exportQuarantined: 'Export them',
    hideNotice: 'Hide',
    reloadNow: 'Reload this tab',
    exportQuarantinedFailed: (detail) =>
      `The records kept apart could not be exported (${detail}). Try again.`,
  },
  direction: (d) => (d === 'x' ? 'x' : 'y'),
};

/** Catalogues by language tag. Add a language here. */
export const catalogues: Readonly<Record<string, MessageCatalogue>> = { en };
