/** POST /api/scenes/[id]/background with the chosen file; returns the stored upload. */
export interface UploadedBackground {
  id: number;
  url: string;
  mime: string;
  bytes: number;
  width: number | null;
  height: number | null;
}

export const backgroundUrl = (sceneId: number, uploadId: string | number) => `/api/scenes/${sceneId}/background/${uploadId}`;

export async function uploadBackground(sceneId: number, file: File): Promise<UploadedBackground> {
  const form = new FormData();
  form.set('file', file, file.name);
  const res = await fetch(`/api/scenes/${sceneId}/background`, { method: 'POST', body: form, credentials: 'same-origin' });
  const body = (await res.json().catch(() => ({}))) as Partial<UploadedBackground> & { error?: string };
  if (!res.ok) throw new Error(body.error ?? `Upload failed (${res.status})`);
  return body as UploadedBackground;
}

/** The natural pixel size of an image URL (for JPEGs whose header did not give it cheaply). */
export function imageSize(url: string): Promise<{ width: number; height: number }> {
  return new Promise((resolve, reject) => {
    const img = new Image();
    img.onload = () => resolve({ width: img.naturalWidth, height: img.naturalHeight });
    img.onerror = () => reject(new Error('The image could not be read'));
    img.src = url;
  });
}
