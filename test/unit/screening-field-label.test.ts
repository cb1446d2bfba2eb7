import { describe, expect, it } from 'vitest';
import { fieldLabel } from '../../calc/index.js';

describe('fieldLabel', () => {
  it('counts storeys and walls from 1, the way the survey form does', () => {
    expect(fieldLabel('storeys[0].walls.x')).toBe('walls of storey 1 (ground) along x');
    expect(fieldLabel('storeys[2].walls.y')).toBe('walls of storey 3 along y');
    expect(fieldLabel('walls[3].positionM')).toBe('wall 4, position');
    expect(fieldLabel('building.storeys[0].floorAreaM2')).toBe('storey 1 (ground), floor area');
  });

  it('drops the unit suffixes and splits the field names into words', () => {
    expect(fieldLabel('observations.uplift[1].gapM')).toBe('uplift entry 2, gap');
    expect(fieldLabel('observations.residualDrift[0].ratio')).toBe('residual drift entry 1, ratio');
    expect(fieldLabel('measured.frequencyHz')).toBe('measured, frequency');
    expect(fieldLabel('building.roofConstruction')).toBe('roof construction');
    expect(fieldLabel('hazard')).toBe('hazard');
  });

  it('reads a finding about several walls as one phrase', () => {
    expect(fieldLabel('walls[0].positionM, walls[1].positionM, walls[4].positionM')).toBe(
      'position of walls 1, 2, 5',
    );
    expect(fieldLabel('walls[0].positionM, building.roofConstruction')).toBe(
      'wall 1, position; roof construction',
    );
  });

  it('returns a path it does not know without hiding it', () => {
    expect(fieldLabel('observations.uplift (wall S1X1)')).toContain('S1X1');
    expect(fieldLabel('')).toBe('');
  });
});
