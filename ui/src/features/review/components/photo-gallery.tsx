import type { PhotoDto } from '@fuelwright/shared';
import { Tag } from '@blueprintjs/core';
import { formatWhen } from '../lib/format';

/** Thumbnails that link to the full photo (cookie-checked downloads, opened in a new tab). */
export function PhotoGallery({ photos, checkLabel }: { photos: readonly PhotoDto[]; checkLabel: (id: string) => string }) {
  return (
    <ul className="fw-photo-grid" aria-label="Photos of this case">
      {photos.map((photo) => {
        const description = photo.caption || `Photo by ${photo.uploaderName}`;
        return (
          <li key={photo.id}>
            <figure className="fw-photo">
              <a href={photo.url} target="_blank" rel="noopener" className="fw-photo-link" aria-label={`Open the full photo: ${description}`}>
                <img src={photo.thumbUrl} alt={description} loading="lazy" width={photo.width} height={photo.height} />
              </a>
              <figcaption>
                {photo.caption && <span className="fw-photo-caption fw-break-word">{photo.caption}</span>}
                {photo.checkId && (
                  <Tag minimal round className="fw-photo-check">
                    {checkLabel(photo.checkId)}
                  </Tag>
                )}
                <span className="fw-small fw-muted">
                  {photo.uploaderName} · <time dateTime={photo.createdAt}>{formatWhen(photo.createdAt)}</time>
                </span>
              </figcaption>
            </figure>
          </li>
        );
      })}
    </ul>
  );
}
