import { Button, Callout, Spinner } from '@blueprintjs/core';
import { MediaIcon } from '@blueprintjs/icons';
import { usePhotos } from '../api/get-photos';
import { PhotoGallery } from './photo-gallery';
import { PhotoUploadForm } from './photo-upload-form';
import { ReviewPanel } from './review-panel';

/** The case's photos and a form to add one (the owner and those the case is shared with). */
export function PhotosPanel({ caseId, checkLabel }: { caseId: string; checkLabel: (id: string) => string }) {
  const photos = usePhotos(caseId);
  return (
    <ReviewPanel id="review-photos" title="Photos" icon={<MediaIcon size={20} className="fw-title-icon" />} className="fw-review-order-4">
      {photos.isPending ? (
        <Spinner size={24} aria-label="Loading photos" />
      ) : photos.isError ? (
        <Callout intent="danger" compact>
          The photos could not be loaded: {photos.error.message}{' '}
          <Button variant="minimal" size="small" text="Try again" onClick={() => void photos.refetch()} />
        </Callout>
      ) : photos.data.length === 0 ? (
        <p className="fw-muted">No photos yet.</p>
      ) : (
        <PhotoGallery photos={photos.data} checkLabel={checkLabel} />
      )}
      <PhotoUploadForm caseId={caseId} />
    </ReviewPanel>
  );
}
