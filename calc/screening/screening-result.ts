/**
 * The result of `screen()`: plain JSON (numbers, strings, booleans, null, arrays, objects;
 * no NaN or Infinity), stored and exported as it is. `resultVersion` changes when the shape
 * changes; `calcVersion` when the numbers can.
 */
import type { DamageState } from '../damage/damage-state.js';
import type { HazusWoodClass } from '../damage/hazus-wood-class.js';
import type { Assumption, MissingInput } from '../storey/findings.js';
import type { DirectionSummary } from './direction-summary.js';
import type { EvidenceItem } from './evidence.js';
import type { PostingLevel } from './posting-level.js';
import type { RockingWallSummary } from './rocking-evidence.js';
import type { ScreeningFlag } from './screening-flags.js';

/** Version of the result's shape. */
export const RESULT_VERSION = 1;

/** Damage-state probabilities of the governing fragility reading. */
export interface ScreeningProbabilities {
  /** Which demand the curves were read at. */
  basis: 'drift' | 'spectral-displacement';
  /** The demand: a drift ratio, or a spectral displacement in m. */
  demand: number;
  /** P(DS ≥ state). */
  exceedance: { slight: number; moderate: number; extensive: number; complete: number };
  /** P(DS = state), summing to 1. */
  discrete: { none: number; slight: number; moderate: number; extensive: number; complete: number };
  /** β per state as used (published β, widened for missing inputs). */
  betas: number[];
  mostLikelyState: DamageState;
}

export interface ScreeningDamage {
  /** The governing damage state: the worse of predicted and observed. */
  state: DamageState;
  word: string;
  /** Least state from the prediction; null when nothing could be predicted (no hazard). */
  predicted: DamageState | null;
  /** Least state from what was observed ('none' when nothing was recorded). */
  observed: DamageState;
  /** Which side set the governing state ('none' when it is None). */
  governedBy: 'predicted' | 'observed' | 'both' | 'none';
  /** Null without a usable hazard. */
  probabilities: ScreeningProbabilities | null;
}

export interface ScreeningPosting {
  level: PostingLevel;
  /** The English word and symbol, as in the app (web/i18n/en/posting.ts). */
  word: string;
  symbol: string;
  meaning: string;
  /** Why this level, one sentence each. */
  reasons: string[];
}

export interface ScreeningConfidence {
  level: 'normal' | 'reduced' | 'low';
  /** One paragraph for people. */
  statement: string;
  /** "field: what was done without it", one per missing or unusable input. */
  missing: string[];
  /** One sentence per default that bears on the verdict. */
  defaulted: string[];
  /** Dispersion added to every fragility β for the uncertain inputs (SRSS), 0 when none. */
  addedBeta: number;
}

export interface ScreeningResult {
  resultVersion: typeof RESULT_VERSION;
  calcVersion: string;
  /** The governing damage state (= damage.state), for readers that look here. */
  damageState: DamageState;
  damage: ScreeningDamage;
  posting: ScreeningPosting;
  /** True when any flag sends the building to a detailed assessment (= flags.length > 0). */
  needsAssessment: boolean;
  flags: ScreeningFlag[];
  /** The verdict in sentences, most important first. */
  reasons: string[];
  /** Predicted and observed evidence side by side. */
  evidence: { predicted: EvidenceItem[]; observed: EvidenceItem[] };
  /** How the building was mapped onto the Hazus wood types. */
  fragilityClass: HazusWoodClass;
  /** Figures of the storey model per direction. */
  directions: { x: DirectionSummary; y: DirectionSummary };
  /** The building's governing figures, for tables and lists. */
  summary: {
    system: string;
    /** Period used per direction, in s, and how it was obtained. */
    periodS: { x: number | null; y: number | null };
    periodKind: { x: string | null; y: string | null };
    /** Largest storey demand over strength, with where; null when unknown. */
    governingDemandToCapacity: number | null;
    governingDemandToCapacityAt: string | null;
    /** Largest inelastic peak drift ratio, null without demand. */
    peakDriftRatio: number | null;
  };
  rockingWalls: RockingWallSummary[];
  confidence: ScreeningConfidence;
  assumptions: Assumption[];
  missingInputs: MissingInput[];
  cautions: string[];
}
