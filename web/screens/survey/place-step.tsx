/**
 * Step 1, "Place": where the building is and who inspects it. The position comes from GPS
 * (its accuracy is shown), from typed coordinates, or from a tap on the map; the address
 * or a description is what the building list shows.
 */
import { useState } from 'preact/hooks';
import { limits } from '../../../forms/index.js';
import {
  ChoiceField,
  NumberField,
  TextField,
  numberSpecFor,
  type FieldChange,
  type NumberSpec,
} from '../../../forms/fields/index.js';
import { formatNumber, formatQuantity, shownUnit } from '../../../forms/units/index.js';
import { LocationPicker } from '../../map/location-picker.js';
import { t } from '../../i18n/index.js';
import { applyFieldChange } from './record-edit.js';
import { applyCoordinateChange, clearLocation, setLocation } from './location-edit.js';
import type { StepProps } from './step-context.js';

type GpsState = { phase: 'idle' } | { phase: 'finding' } | { phase: 'failed'; message: string };

function gpsErrorMessage(error: GeolocationPositionError | null): string {
  if (error === null) return t('place.gps.unsupported');
  switch (error.code) {
    case error.PERMISSION_DENIED:
      return t('place.gps.denied');
    case error.TIMEOUT:
      return t('place.gps.timeout');
    default:
      return t('place.gps.unavailable');
  }
}

const LAT = numberSpecFor('location.lat') as NumberSpec;
const LON = numberSpecFor('location.lon') as NumberSpec;

/** How long a GPS fix may take before we say so, ms (common practice, no source). */
const GPS_TIMEOUT_MS = 30_000;

export function PlaceStep({ ctx }: StepProps) {
  const { record, edit, system } = ctx;
  const [gps, setGps] = useState<GpsState>({ phase: 'idle' });
  const [picking, setPicking] = useState(false);
  const text = (c: FieldChange) => edit((r) => applyFieldChange(r, c));
  const coord = (c: FieldChange) => edit((r) => applyCoordinateChange(r, c, system));
  const loc = record.location;

  const findPosition = () => {
    if (!('geolocation' in navigator)) {
      setGps({ phase: 'failed', message: gpsErrorMessage(null) });
      return;
    }
    setGps({ phase: 'finding' });
    navigator.geolocation.getCurrentPosition(
      (pos) => {
        setGps({ phase: 'idle' });
        edit((r) =>
          setLocation(r, pos.coords.latitude, pos.coords.longitude, pos.coords.accuracy, 'gps'),
        );
      },
      (err) => setGps({ phase: 'failed', message: gpsErrorMessage(err) }),
      { enableHighAccuracy: true, timeout: GPS_TIMEOUT_MS, maximumAge: 60_000 },
    );
  };

  const accuracyUnit = t(`unit.${shownUnit('length', system)}`);
  return (
    <div class="step step--place">
      <TextField
        path="address"
        label={t('field.address')}
        hint={t('place.addressHint')}
        value={record.address}
        pending={record.unparsed['address']}
        maxLength={limits.MAX_SHORT_TEXT}
        autocomplete="street-address"
        onChange={text}
      />

      <section class="card" aria-labelledby="place-position" id="section-place">
        <h2 id="place-position">{t('place.position')}</h2>
        {loc ? (
          <p class="position-summary" id="position-summary">
            <span class="position-summary__coords">
              {formatNumber(loc.lat, 'coord')}, {formatNumber(loc.lon, 'coord')}
            </span>
            <span class="position-summary__source">
              {loc.source === 'gps' && loc.accuracyM !== null
                ? t('place.fromGps', {
                    accuracy: formatQuantity(loc.accuracyM, 'length', system, 0),
                    unit: accuracyUnit,
                  })
                : loc.source === 'map'
                  ? t('place.fromMap')
                  : t('place.typed')}
            </span>
          </p>
        ) : (
          <p class="muted">{t('place.noPosition')}</p>
        )}
        {loc && loc.source === 'gps' && loc.accuracyM !== null && loc.accuracyM > 50 && (
          <p class="field__warning">
            <span aria-hidden="true">⚠ </span>
            {t('place.gps.poor')}
          </p>
        )}
        <div class="button-row">
          <button
            type="button"
            class="button button--primary"
            onClick={findPosition}
            disabled={gps.phase === 'finding'}
          >
            <span aria-hidden="true">◎</span> {t('place.useGps')}
          </button>
          <button
            type="button"
            class="button"
            aria-expanded={picking}
            onClick={() => setPicking(!picking)}
          >
            <span aria-hidden="true">✛</span> {t('place.pickOnMap')}
          </button>
          {loc && (
            <button type="button" class="button" onClick={() => edit(clearLocation)}>
              {t('place.clearPosition')}
            </button>
          )}
        </div>
        <p role="status" aria-live="polite" class="gps-status">
          {gps.phase === 'finding' && t('place.gps.finding')}
          {gps.phase === 'failed' && gps.message}
        </p>
        {picking && (
          <LocationPicker
            start={loc ? { lat: loc.lat, lon: loc.lon } : null}
            surveyId={record.id}
            onUse={(lat, lon) => {
              setPicking(false);
              edit((r) => setLocation(r, lat, lon, null, 'map'));
            }}
            onCancel={() => setPicking(false)}
          />
        )}
        <p class="field__hint">{t('place.mapHint')}</p>
        <div class="field-pair">
          <NumberField
            path="location.lat"
            spec={LAT}
            system={system}
            value={loc?.lat ?? null}
            pending={record.unparsed['location.lat']}
            onChange={coord}
          />
          <NumberField
            path="location.lon"
            spec={LON}
            system={system}
            value={loc?.lon ?? null}
            pending={record.unparsed['location.lon']}
            onChange={coord}
          />
        </div>
      </section>

      <section class="card" aria-labelledby="place-people">
        <h2 id="place-people">{t('place.people')}</h2>
        <TextField
          path="inspector"
          label={t('field.inspector')}
          value={record.inspector}
          pending={record.unparsed['inspector']}
          maxLength={limits.MAX_SHORT_TEXT}
          autocomplete="name"
          onChange={text}
        />
        <TextField
          path="team"
          label={t('field.team')}
          value={record.team}
          pending={record.unparsed['team']}
          maxLength={limits.MAX_SHORT_TEXT}
          onChange={text}
        />
        <ChoiceField
          path="inspectionKind"
          legend={t('field.inspectionKind')}
          layout="row"
          options={[
            { value: 'first', label: t('place.visit.first') },
            { value: 'reinspection', label: t('place.visit.again') },
          ]}
          value={record.inspectionKind}
          onChoose={(v) => edit((r) => ({ ...r, inspectionKind: v }))}
        />
      </section>
    </div>
  );
}
