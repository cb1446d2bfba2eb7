// Searching and filtering the building list.
import { describe, expect, it } from 'vitest';
import { emptySurvey, type SurveyRecord } from '../../forms/index.js';
import { filterBuildings, fold, matchesSearch } from '../../web/screens/home/building-filter.js';

const rec = (id: string, patch: Partial<SurveyRecord>): SurveyRecord => ({
  ...emptySurvey('d', new Date('2025-01-01T10:00:00Z'), id),
  ...patch,
});
const a = rec('00000000-0000-4000-8000-000000000001', {
  address: 'Schulstraße 4, Müllheim',
  inspector: 'A. Ngata',
  result: {
    calcVersion: '0.1.0',
    computedAt: '2025-01-01T10:05:00Z',
    result: { posting: 'limited' },
  },
});
const b = rec('00000000-0000-4000-8000-000000000002', {
  address: 'Old mill',
  team: 'North',
  lastExportedAt: '2025-01-01T11:00:00Z',
});

describe('building list search', () => {
  it('matches every word in any order, ignoring case and accents', () => {
    expect(matchesSearch(a, 'mullheim SCHUL')).toBe(true);
    expect(matchesSearch(a, 'ngata')).toBe(true);
    expect(matchesSearch(a, 'mill')).toBe(false);
    expect(matchesSearch(b, '  ')).toBe(true);
    expect(fold('Ärger Öl')).toBe('arger ol');
  });
});

describe('building list filter', () => {
  it('filters by posting, by not screened and by not exported', () => {
    expect(filterBuildings([a, b], '', 'limited')).toEqual([a]);
    expect(filterBuildings([a, b], '', 'open')).toEqual([]);
    expect(filterBuildings([a, b], '', 'unscreened')).toEqual([b]);
    expect(filterBuildings([a, b], '', 'not-exported')).toEqual([a]);
    expect(filterBuildings([a, b], 'north', 'all')).toEqual([b]);
  });
});
