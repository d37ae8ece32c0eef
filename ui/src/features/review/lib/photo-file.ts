/** What the server accepts (it checks the content too; this only saves a doomed upload). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTO_ACCEPT = PHOTO_TYPES.join(',');
/** The server's limit per photo. */
export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
export const CAPTION_MAX_LENGTH = 300;

/** "2.4 MB", "830 kB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} kB`;
}

/**
 * A reason not to send this file, or null. An empty type (some phones and file managers give none)
 * is left for the server to judge by content.
 */
export function photoFileProblem(file: Pick<File, 'size' | 'type'>): string | null {
  if (file.size === 0) return 'The file is empty. Take or choose the photo again.';
  if (file.size > PHOTO_MAX_BYTES) return `The photo is ${formatBytes(file.size)}; the limit is 15 MB. Send a smaller one.`;
  const type = file.type.toLowerCase();
  if (type && !(PHOTO_TYPES as readonly string[]).includes(type)) {
    if (type === 'image/heic' || type === 'image/heif') {
      return 'HEIC photos are not accepted. Set the camera to save JPEG ("most compatible"), or send a screenshot of the photo.';
    }
    return 'Only JPEG, PNG and WebP photos are accepted.';
  }
  return null;
}
