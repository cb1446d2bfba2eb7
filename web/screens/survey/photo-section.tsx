/**
 * Photos from the camera. Each photo is downscaled on the device and stored (location data
 * removed unless the inspector keeps it) before it is listed in the record, so a record never
 * points at a missing image. Thumbnails are object URLs of the stored Blobs.
 */
import { useEffect, useState } from 'preact/hooks';
import { limits, type PhotoMeta } from '../../../forms/index.js';
import { TextField } from '../../../forms/fields/index.js';
import { getDefaultStore, preparePhoto, savePhoto } from '../../storage/index.js';
import { en as schemaMessages } from '../../../forms/index.js';
import { t } from '../../i18n/index.js';
import { applyFieldChange } from './record-edit.js';
import type { StepProps } from './step-context.js';

function Thumbnail({ photo }: { photo: PhotoMeta }) {
  const [url, setUrl] = useState<string | null>(null);
  const [missing, setMissing] = useState(false);
  useEffect(() => {
    let objectUrl: string | null = null;
    let live = true;
    void getDefaultStore()
      .getPhoto(photo.id)
      .then((row) => {
        if (!live) return;
        if (!row) {
          setMissing(true);
          return;
        }
        objectUrl = URL.createObjectURL(row.blob);
        setUrl(objectUrl);
      })
      .catch(() => live && setMissing(true));
    return () => {
      live = false;
      if (objectUrl) URL.revokeObjectURL(objectUrl);
    };
  }, [photo.id]);
  if (missing) return <p class="photo__missing">{schemaMessages.storage.photoUnreadable}</p>;
  return url ? (
    <img class="photo__img" src={url} alt={photo.caption || t('photos.untitled')} />
  ) : (
    <div class="photo__img photo__img--loading" aria-hidden="true" />
  );
}

export function PhotoSection({ ctx }: StepProps) {
  const { record, edit } = ctx;
  const [keepLocation, setKeepLocation] = useState(false);
  const [status, setStatus] = useState<string>('');

  const onFiles = async (input: HTMLInputElement) => {
    const files = [...(input.files ?? [])];
    input.value = '';
    let added = 0;
    for (const file of files) {
      setStatus(t('photos.saving'));
      try {
        const prepared = await preparePhoto(file, { keepLocation });
        const meta = await savePhoto(getDefaultStore(), record.id, prepared, {
          takenAt: file.lastModified ? new Date(file.lastModified) : null,
          caption: '',
        });
        edit((r) => ({ ...r, photos: [...r.photos, meta] }));
        added++;
      } catch {
        setStatus(schemaMessages.storage.photoUnreadable);
        return;
      }
    }
    setStatus(added > 0 ? t('photos.added', { count: added }) : '');
  };

  const remove = (index: number) => {
    const photo = record.photos[index];
    if (!photo || !window.confirm(t('photos.removeConfirm'))) return;
    edit((r) => ({ ...r, photos: r.photos.filter((p) => p.id !== photo.id) }));
    void getDefaultStore()
      .deletePhoto(photo.id)
      .catch(() => undefined);
  };

  return (
    <section class="card" aria-labelledby="photos-title">
      <h2 id="photos-title">{t('photos.title')}</h2>
      <label class="button button--primary button--wide file-button">
        {t('photos.take')}
        <input
          type="file"
          accept="image/*"
          capture="environment"
          multiple
          class="visually-hidden"
          onChange={(e) => void onFiles(e.currentTarget as HTMLInputElement)}
        />
      </label>
      <label class="check">
        <input
          type="checkbox"
          checked={keepLocation}
          onChange={(e) => setKeepLocation((e.currentTarget as HTMLInputElement).checked)}
        />
        <span>{t('photos.keepLocation')}</span>
      </label>
      <p role="status" aria-live="polite" class="photo-status">
        {status}
      </p>
      <ul class="photo-list">
        {record.photos.map((p, i) => (
          <li key={p.id} class="photo">
            <Thumbnail photo={p} />
            <TextField
              path={`photos.${i}.caption`}
              label={t('photos.captionOf', { n: i + 1 })}
              value={p.caption}
              pending={record.unparsed[`photos.${i}.caption`]}
              maxLength={limits.MAX_SHORT_TEXT}
              onChange={(c) => edit((r) => applyFieldChange(r, c))}
            />
            <button
              type="button"
              class="button button--small button--quiet"
              onClick={() => remove(i)}
            >
              {t('photos.remove')}
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
