/**
 * Settings: units (SI or US customary), display (high contrast for sunlight, large text),
 * the inspector's name and team for new surveys, the team's hazard of the day, device
 * storage, and the app version.
 */
import { useEffect, useState } from 'preact/hooks';
import '../../styles/screens.css';
import { ChoiceField, TextField } from '../../../forms/fields/index.js';
import { limits } from '../../../forms/index.js';
import { t } from '../../i18n/index.js';
import { checkForUpdate } from '../../app/service-worker.js';
import {
  readDisplayPreferences,
  saveDisplayPreferences,
  type DisplayPreferences,
} from '../../app/display-preferences.js';
import { useStore } from '../../app/store.js';
import { storageStatus, type StorageStatus } from '../../storage/index.js';
import {
  forgetTeamHazard,
  loadTeamHazard,
  localDay,
  setPreferences,
  teamHazardStore,
  usePreferences,
} from './preferences.js';

function megabytes(bytes: number | null): string {
  return bytes === null ? '—' : (bytes / 1e6).toFixed(1);
}

export function SettingsScreen() {
  const prefs = usePreferences();
  const team = useStore(teamHazardStore);
  const [display, setDisplay] = useState<DisplayPreferences>(readDisplayPreferences());
  const [storage, setStorage] = useState<StorageStatus | null>(null);
  useEffect(() => {
    void loadTeamHazard();
    void storageStatus()
      .then(setStorage)
      .catch(() => setStorage(null));
  }, []);
  const changeDisplay = (patch: Partial<DisplayPreferences>) => {
    const next = { ...display, ...patch };
    setDisplay(next);
    saveDisplayPreferences(next);
  };
  const today = team !== null && team.day === localDay(new Date());

  return (
    <main class="screen settings" id="main">
      <h1>{t('nav.settings')}</h1>

      <section class="card" aria-labelledby="units-title">
        <h2 id="units-title">{t('settings.units')}</h2>
        <ChoiceField
          path="settings.units"
          legend={t('settings.unitsLegend')}
          options={[
            { value: 'si', label: t('settings.units.si'), detail: t('settings.units.si.detail') },
            { value: 'us', label: t('settings.units.us'), detail: t('settings.units.us.detail') },
          ]}
          value={prefs.units}
          onChoose={(units) => setPreferences({ units })}
          hint={t('settings.unitsHint')}
        />
      </section>

      <section class="card" aria-labelledby="display-title">
        <h2 id="display-title">{t('settings.display')}</h2>
        <label class="check">
          <input
            type="checkbox"
            checked={display.highContrast}
            onChange={(e) =>
              changeDisplay({ highContrast: (e.currentTarget as HTMLInputElement).checked })
            }
          />
          <span>{t('settings.highContrast')}</span>
        </label>
        <label class="check">
          <input
            type="checkbox"
            checked={display.largeText}
            onChange={(e) =>
              changeDisplay({ largeText: (e.currentTarget as HTMLInputElement).checked })
            }
          />
          <span>{t('settings.largeText')}</span>
        </label>
      </section>

      <section class="card" aria-labelledby="people-title">
        <h2 id="people-title">{t('settings.forNewSurveys')}</h2>
        <TextField
          path="settings.inspector"
          label={t('field.inspector')}
          value={prefs.inspector}
          maxLength={limits.MAX_SHORT_TEXT}
          autocomplete="name"
          onChange={(c) => c.kind === 'value' && setPreferences({ inspector: c.value as string })}
        />
        <TextField
          path="settings.team"
          label={t('field.team')}
          value={prefs.team}
          maxLength={limits.MAX_SHORT_TEXT}
          onChange={(c) => c.kind === 'value' && setPreferences({ team: c.value as string })}
        />
      </section>

      <section class="card" aria-labelledby="hazard-title">
        <h2 id="hazard-title">{t('settings.teamHazard')}</h2>
        {team === null ? (
          <p class="muted">{t('settings.teamHazardNone')}</p>
        ) : (
          <>
            <p>
              {t(today ? 'settings.teamHazardToday' : 'settings.teamHazardOld', {
                kind: t(`hazard.kind.${team.hazard.kind}`),
                when: new Date(team.setAt).toLocaleString(),
              })}
            </p>
            <button type="button" class="button" onClick={() => void forgetTeamHazard()}>
              {t('settings.teamHazardForget')}
            </button>
          </>
        )}
        <p class="field__hint">{t('settings.teamHazardHint')}</p>
      </section>

      <section class="card" aria-labelledby="storage-title">
        <h2 id="storage-title">{t('settings.storage')}</h2>
        {storage ? (
          <>
            <p>
              {t('settings.storageUse', {
                used: megabytes(storage.usageBytes),
                quota: megabytes(storage.quotaBytes),
              })}
            </p>
            <p>
              {storage.persisted === true
                ? t('settings.persisted')
                : storage.persisted === false
                  ? t('settings.notPersisted')
                  : t('settings.persistUnknown')}
            </p>
            {storage.warning && (
              <p class="field__warning">
                <span aria-hidden="true">⚠ </span>
                {storage.warning}
              </p>
            )}
          </>
        ) : (
          <p class="muted">{t('loading')}</p>
        )}
      </section>

      <section class="card" aria-labelledby="version-title">
        <h2 id="version-title">{t('settings.version')}</h2>
        <p>
          <button type="button" class="button" onClick={() => void checkForUpdate()}>
            {t('settings.checkUpdate')}
          </button>
        </p>
        <p class="muted">{t('settings.build', { build: __BUILD_ID__ })}</p>
      </section>
    </main>
  );
}
