/**
 * A new survey record: the empty draft of forms/, with the inspector and team from the
 * settings and — when the team set one today — the team's hazard, marked unconfirmed so the
 * inspector checks it before screening.
 */
import { emptySurvey, markUnconfirmed, type SurveyRecord } from '../../../forms/index.js';
import type { FieldPreferences, TeamHazard } from '../settings/preferences.js';

export function newSurveyRecord(
  deviceId: string,
  now: Date,
  prefs: Pick<FieldPreferences, 'inspector' | 'team'>,
  teamHazard: TeamHazard | null,
): SurveyRecord {
  let record: SurveyRecord = {
    ...emptySurvey(deviceId, now),
    inspector: prefs.inspector,
    team: prefs.team,
  };
  if (teamHazard) record = markUnconfirmed({ ...record, hazard: teamHazard.hazard }, 'hazard');
  return record;
}
