import { useEffect, useRef, useState, type ChangeEvent, type FormEvent } from 'react';
import { Button, Callout } from '@blueprintjs/core';
import { CameraIcon, CloudUploadIcon, MediaIcon } from '@blueprintjs/icons';
import { TextField } from '../../../components/text-field';
import { useNotify } from '../../../components/toaster';
import { isApiError } from '../../../lib/api-client';
import { useMediaQuery } from '../../../lib/use-media-query';
import { useUploadPhoto } from '../api/upload-photo';
import { CAPTION_MAX_LENGTH, formatBytes, PHOTO_ACCEPT, photoFileProblem } from '../lib/photo-file';

/** Phones and tablets: offer the camera as well as the photo library. */
const TOUCH_QUERY = '(pointer: coarse), (max-width: 767px)';

/** The message for a refused upload: the server's words about the file first. */
function uploadErrorMessage(error: unknown): string | null {
  if (!error) return null;
  if (!isApiError(error)) return error instanceof Error ? error.message : String(error);
  const file = error.fieldErrors('file');
  if (file.length > 0) return file.join(' ');
  if (error.status === 413) return 'The photo is larger than 15 MB. Send a smaller one.';
  const other = Object.values(error.fields).flat();
  return other.length > 0 ? other.join(' ') : error.message;
}

/**
 * Takes or chooses one photo (JPEG, PNG or WebP, at most 15 MB), shows it, and uploads it with an
 * optional caption. `photoRequestId` answers a request; `checkId` ties the photo to a check.
 */
export function PhotoUploadForm({
  caseId,
  photoRequestId,
  checkId,
  idPrefix = 'review-photo',
  onUploaded,
  onCancel,
}: {
  caseId: string;
  photoRequestId?: string;
  checkId?: string | null;
  idPrefix?: string;
  onUploaded?: () => void;
  onCancel?: () => void;
}) {
  const touch = useMediaQuery(TOUCH_QUERY);
  const cameraInput = useRef<HTMLInputElement>(null);
  const libraryInput = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [caption, setCaption] = useState('');
  const [preview, setPreview] = useState<string | null>(null);
  const upload = useUploadPhoto(caseId);
  const notify = useNotify();

  useEffect(() => {
    if (!file || typeof URL.createObjectURL !== 'function') {
      setPreview(null);
      return;
    }
    const url = URL.createObjectURL(file);
    setPreview(url);
    return () => URL.revokeObjectURL(url);
  }, [file]);

  const pick = (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.currentTarget.files?.[0] ?? null;
    event.currentTarget.value = '';
    if (!chosen) return;
    upload.reset();
    setProblem(photoFileProblem(chosen));
    setFile(chosen);
  };

  const clear = () => {
    setFile(null);
    setProblem(null);
    upload.reset();
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!file || problem) return;
    upload.mutate(
      { file, caption: caption.trim() || undefined, photoRequestId, checkId: checkId ?? undefined },
      {
        onSuccess: () => {
          notify.success('Photo added to the case.');
          setFile(null);
          setCaption('');
          onUploaded?.();
        },
      },
    );
  };

  const error = problem ?? uploadErrorMessage(upload.error);

  return (
    <form className="fw-photo-upload" onSubmit={submit} noValidate aria-label={photoRequestId ? 'Answer with a photo' : 'Add a photo'}>
      <input
        ref={cameraInput}
        id={`${idPrefix}-camera`}
        className="fw-visually-hidden"
        type="file"
        accept={PHOTO_ACCEPT}
        capture="environment"
        tabIndex={-1}
        aria-label="Take a photo"
        onChange={pick}
      />
      <input
        ref={libraryInput}
        id={`${idPrefix}-file`}
        className="fw-visually-hidden"
        type="file"
        accept={PHOTO_ACCEPT}
        tabIndex={-1}
        aria-label="Photo file"
        onChange={pick}
      />
      {file && (
        <div className="fw-photo-chosen">
          {preview && !problem && <img className="fw-photo-preview" src={preview} alt="The photo to upload" />}
          <div className="fw-small fw-break">
            {file.name || 'Photo'} · {formatBytes(file.size)}
          </div>
        </div>
      )}
      {error && (
        <Callout className="fw-form-error" intent="danger" role="alert">
          {error}
        </Callout>
      )}
      {file && !problem ? (
        <>
          <TextField
            id={`${idPrefix}-caption`}
            label="Caption (optional)"
            maxLength={CAPTION_MAX_LENGTH}
            value={caption}
            onChange={setCaption}
            errors={isApiError(upload.error) ? upload.error.fieldErrors('caption') : []}
            hint="What it shows, for example: foam block out of the bowl."
          />
          <div className="fw-review-actions">
            <Button className="fw-touch" type="submit" intent="primary" size="large" icon={<CloudUploadIcon />} text="Upload photo" loading={upload.isPending} />
            <Button className="fw-touch" size="large" variant="outlined" text="Choose another" disabled={upload.isPending} onClick={clear} />
          </div>
        </>
      ) : (
        <div className="fw-review-actions">
          {touch && (
            <Button className="fw-touch" size="large" intent="primary" icon={<CameraIcon />} text="Take a photo" onClick={() => cameraInput.current?.click()} />
          )}
          <Button
            className="fw-touch"
            size="large"
            intent={touch ? 'none' : 'primary'}
            variant={touch ? 'outlined' : 'solid'}
            icon={<MediaIcon />}
            text={file ? 'Choose another photo' : 'Choose a photo'}
            onClick={() => libraryInput.current?.click()}
          />
          {onCancel && <Button className="fw-touch" size="large" variant="minimal" text="Cancel" onClick={onCancel} />}
        </div>
      )}
      <p className="fw-small fw-muted fw-review-note">JPEG, PNG or WebP, up to 15 MB. Location and camera details are removed before the photo is stored.</p>
    </form>
  );
}
