import { storeyName } from '../storey/storey-name.js';

/**
 * Words for a field path of a missing or unusable input, for people reading a result:
 * `walls[3].positionM` → "wall 4, position"; `building.storeys[0].floorAreaM2` →
 * "storey 1 (ground), floor area"; `storeys[1].walls.x` → "walls of storey 2 along x".
 * Paths it does not know come back as they are, so nothing is hidden. The raw path stays
 * in `missingInputs[].field` for engineers and software.
 */
export function fieldLabel(path: string): string {
  // Several paths of one finding ("walls[0].positionM, walls[3].positionM").
  if (path.includes(', ')) {
    const labels = path.split(', ').map(fieldLabel);
    const walls = labels.map((l) => /^wall (\d+), (.+)$/.exec(l));
    const prop = walls[0]?.[2];
    if (prop !== undefined && walls.every((m) => m !== null && m[2] === prop)) {
      return `${prop} of walls ${walls.map((m) => m![1]).join(', ')}`;
    }
    return labels.join('; ');
  }
  const storeyWalls = /^storeys\[(\d+)\]\.walls\.(x|y)$/.exec(path);
  if (storeyWalls) return `walls of ${storeyName(Number(storeyWalls[1]))} along ${storeyWalls[2]}`;
  const directionWalls = /^walls \((x|y)\)$/.exec(path);
  if (directionWalls) return `walls along ${directionWalls[1]}`;

  const parts = path.split('.');
  const words: string[] = [];
  for (const [i, part] of parts.entries()) {
    const indexed = /^([A-Za-z]+)\[(\d+)\]$/.exec(part);
    const name = indexed ? indexed[1]! : part;
    const n = indexed ? Number(indexed[2]) : null;
    if (name === 'building' && i === 0 && parts.length > 1) continue;
    if (name === 'observations' && i === 0 && parts.length > 1) continue;
    if (name === 'storeys' && n !== null) words.push(storeyName(n));
    else if (name === 'walls' && n !== null) words.push(`wall ${n + 1}`);
    else if (n !== null) words.push(`${wordsOf(name)} entry ${n + 1}`);
    else words.push(wordsOf(name));
  }
  return words.length > 0 ? words.join(', ') : path;
}

/** Unit suffixes the schema puts on SI field names (positionM, floorAreaM2, selfWeightN). */
const UNIT_SUFFIX = /(?<=[a-z])(M2|M|N|Pa|S|Hz|Rad|G|Kg)$/;

/** "floorAreaM2" → "floor area"; "residualDrift" → "residual drift". */
function wordsOf(name: string): string {
  // Only plain camelCase identifiers are field names; anything else (an id, free text) is
  // kept exactly as written.
  if (!/^[a-z][A-Za-z0-9]*$/.test(name)) return name;
  const bare = name.replace(UNIT_SUFFIX, '');
  return bare
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .trim();
}
