import type { PhotoToKeep } from '../offline/records';

/** Long side in pixels: enough to see a knit line or a void, small enough for press-side Wi-Fi. */
export const MAX_SIDE = 1600;
const JPEG_QUALITY = 0.82;

function hex(buffer: ArrayBuffer): string {
  return [...new Uint8Array(buffer)].map((byte) => byte.toString(16).padStart(2, '0')).join('');
}

export async function sha256Hex(blob: Blob): Promise<string> {
  return hex(await crypto.subtle.digest('SHA-256', await blob.arrayBuffer()));
}

async function encode(canvas: HTMLCanvasElement): Promise<Blob> {
  return new Promise((resolve, reject) =>
    canvas.toBlob(
      (blob) => (blob ? resolve(blob) : reject(new Error('The photo could not be encoded.'))),
      'image/jpeg',
      JPEG_QUALITY,
    ),
  );
}

/**
 * Shrinks a camera photo on the device (a tablet camera gives 10 MB and more) and names it by
 * the SHA-256 of the bytes it keeps, which is how the server stores it.
 */
export async function preparePhoto(file: Blob): Promise<PhotoToKeep> {
  const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  const scale = Math.min(1, MAX_SIDE / Math.max(bitmap.width, bitmap.height));
  const width = Math.round(bitmap.width * scale);
  const height = Math.round(bitmap.height * scale);
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const context = canvas.getContext('2d');
  if (!context) throw new Error('This browser cannot draw the photo.');
  context.drawImage(bitmap, 0, 0, width, height);
  bitmap.close();
  const blob = await encode(canvas);
  return { sha256: await sha256Hex(blob), blob, mime: 'image/jpeg', width, height };
}
