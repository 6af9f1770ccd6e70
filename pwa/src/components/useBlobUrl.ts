import { useEffect, useState } from 'react';

/**
 * A Blob as a data: URL for an <img>. Data URLs need no revoking, so nothing leaks and React's
 * double effects in development cannot break them. `id` names the picture: a new Blob of the
 * same picture (the device store hands out a fresh one on every change) keeps the old URL
 * until its own is ready, so the image does not flicker.
 */
export function useBlobUrl(blob: Blob | undefined, id?: string): string | undefined {
  const [shown, setShown] = useState<{ blob: Blob; id?: string; url: string }>();
  useEffect(() => {
    if (!blob) return;
    const reader = new FileReader();
    reader.onload = () => setShown({ blob, id, url: String(reader.result) });
    reader.readAsDataURL(blob);
    return () => reader.abort();
  }, [blob, id]);
  if (!blob || !shown) return undefined;
  return shown.blob === blob || (id !== undefined && shown.id === id) ? shown.url : undefined;
}
