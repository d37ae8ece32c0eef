import { ThumbsUpIcon } from '@blueprintjs/icons';
import type { CaseDto } from '@fuelwright/shared';
import { useRequiredUser } from '../../../lib/current-user';
import { CommentsPanel } from './comments-panel';
import { PhotoRequestsPanel } from './photo-requests-panel';
import { PhotosPanel } from './photos-panel';
import { RecommendationList, RecommendCheckPanel } from './recommend-check-panel';
import { ReviewPanel } from './review-panel';
import { SharePanel } from './share-panel';
import '../review.css';

/** What the case page hands to its review section. */
export interface CaseReviewProps {
  c: CaseDto;
  /** A check's label in the case's catalog. */
  checkLabel: (checkId: string) => string;
  /** Receives the case after a review step that changes it (a recommended check). */
  onCase: (c: CaseDto) => void;
}

/**
 * The remote-review part of the case page. The owner shares the case, answers photo requests and
 * reads the recommendations; a coach or shop it is shared with recommends a check and asks for
 * photos. Both sides comment and add photos. The case's facts stay the owner's to change.
 */
export function CaseReview({ c, checkLabel, onCase }: CaseReviewProps) {
  const viewer = useRequiredUser();
  const owner = viewer.id === c.ownerId;
  const open = c.state === 'open';
  return (
    <section className="fw-review" aria-label="Review">
      <div className="fw-review-column">
        {!owner && open && <RecommendCheckPanel c={c} checkLabel={checkLabel} onCase={onCase} />}
        {!owner && !open && c.recommendations.length > 0 && (
          <ReviewPanel id="review-recommend" title="Recommended checks" icon={<ThumbsUpIcon size={20} className="fw-title-icon" />} className="fw-review-order-1">
            <RecommendationList c={c} checkLabel={checkLabel} />
          </ReviewPanel>
        )}
        {owner && c.recommendations.length > 0 && (
          <ReviewPanel id="review-recommend" title="Recommended checks" icon={<ThumbsUpIcon size={20} className="fw-title-icon" />} className="fw-review-order-1">
            <p className="fw-muted fw-small fw-review-lead">A recommended check leads your plan until you record its result.</p>
            <RecommendationList c={c} checkLabel={checkLabel} />
          </ReviewPanel>
        )}
        <CommentsPanel caseId={c.id} />
      </div>
      <div className="fw-review-column">
        <PhotoRequestsPanel c={c} canAsk={!owner} canAnswer={owner} checkLabel={checkLabel} />
        <PhotosPanel caseId={c.id} checkLabel={checkLabel} />
        {owner && <SharePanel c={c} />}
      </div>
    </section>
  );
}
