import type { ComponentType } from 'react';
import {
  AnnotationIcon,
  ClipboardIcon,
  DisableIcon,
  EditIcon,
  EndorsedIcon,
  FolderNewIcon,
  HandIcon,
  type SVGIconProps,
} from '@blueprintjs/icons';
import type { CaseEventDto, CaseEventType } from '@fuelwright/shared';
import type { CatalogLabels } from '../lib/catalog-labels';
import { formatProbability } from '../lib/case-list';
import { formatDateTime } from '../lib/format';

const ICONS: Partial<Record<CaseEventType, ComponentType<SVGIconProps>>> = {
  opened: FolderNewIcon,
  'symptoms-reported': AnnotationIcon,
  'check-recorded': ClipboardIcon,
  resolved: EndorsedIcon,
  abandoned: DisableIcon,
  stopped: HandIcon,
  'facts-corrected': EditIcon,
};

/** Every step of the case in order: what happened, who did it and when, and the top causes after it. */
export function CaseTimeline({ events, labels }: { events: CaseEventDto[]; labels: CatalogLabels }) {
  return (
    <ol className="fw-timeline" aria-label="Timeline">
      {events.map((event) => {
        const Icon = ICONS[event.type] ?? ClipboardIcon;
        return (
          <li key={event.seq} className={`fw-timeline-event fw-timeline-${event.type}`} data-event-type={event.type}>
            <span className="fw-timeline-icon" aria-hidden="true">
              <Icon size={16} />
            </span>
            <div className="fw-timeline-body">
              <div className="fw-timeline-summary fw-break-word">{labels.text(event.summary)}</div>
              <div className="fw-small fw-muted">
                {event.actorName} · <time dateTime={event.at}>{formatDateTime(event.at)}</time>
              </div>
              {event.topCauses && event.topCauses.length > 0 && (
                <div className="fw-timeline-causes">
                  <span className="fw-small fw-muted">Top causes after this step:</span>
                  <ul>
                    {event.topCauses.map((cause) => (
                      <li key={cause.id}>
                        <span className="fw-break-word">{labels.cause(cause.id)}</span>{' '}
                        <strong className="fw-nowrap">{formatProbability(cause.probability)}</strong>
                      </li>
                    ))}
                  </ul>
                </div>
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
