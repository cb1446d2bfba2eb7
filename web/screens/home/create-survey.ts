/**
 * Starts a new survey on this device: a new record with the inspector's name and team from
 * the settings and, when the team set one today, the team's hazard (marked unconfirmed),
 * saved as revision 1 before the first step opens.
 */
import type { SurveyRecord } from '../../../forms/index.js';
import { getDefaultStore } from '../../storage/index.js';
import { readPreferences, todaysTeamHazard } from '../settings/preferences.js';
import { newSurveyRecord } from '../survey/new-survey.js';

export async function createSurveyNow(now: Date = new Date()): Promise<SurveyRecord> {
  const store = getDefaultStore();
  const deviceId = await store.getDeviceId();
  const record = newSurveyRecord(deviceId, now, readPreferences(), await todaysTeamHazard(now));
  const outcome = await store.saveDraft(record, { baseRevision: 0 });
  if (outcome.status !== 'saved')
    throw new Error(`new survey ${record.id} collided with a stored one`);
  return outcome.record;
}
