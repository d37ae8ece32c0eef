import type { Intent } from '@blueprintjs/core';
import type { ProposalDto } from '@fuelwright/shared';

/** A proposal's status in words, and the tag colour it gets. */
export const PROPOSAL_STATUS: Record<ProposalDto['status'], { label: string; intent: Intent }> = {
  running: { label: 'Running', intent: 'none' },
  ready: { label: 'Ready', intent: 'success' },
  published: { label: 'Published', intent: 'primary' },
  failed: { label: 'Failed', intent: 'danger' },
  discarded: { label: 'Discarded', intent: 'none' },
};
