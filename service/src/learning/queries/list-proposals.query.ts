import { Query } from '@nestjs/cqrs';
import type { ProposalSummaryDto } from '@fuelwright/shared';

/** The newest proposals first, as summaries (no diff). Shops and admins see every proposal. */
export class ListProposalsQuery extends Query<ProposalSummaryDto[]> {}
