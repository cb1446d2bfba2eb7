/**
 * The storage notices, loaded after the first paint: the storage layer is the largest part
 * of the app's code, and the first screen must not wait for it to become usable.
 */
import type { ComponentType } from 'preact';
import { useEffect, useState } from 'preact/hooks';

export function DeferredStorageNotices() {
  const [Notices, setNotices] = useState<ComponentType | null>(null);
  useEffect(() => {
    let live = true;
    void import('../storage/storage-notices.js').then((m) => {
      if (live) setNotices(() => m.StorageNotices);
    });
    return () => {
      live = false;
    };
  }, []);
  return Notices ? <Notices /> : null;
}
