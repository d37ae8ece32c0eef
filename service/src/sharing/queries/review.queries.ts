import { Query } from '@nestjs/cqrs';
import type { CommentDto, PhotoRequestDto, ShareDto, SharedCaseSummaryDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class ListSharesQuery extends Query<ShareDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly filter: { kartId?: string; caseId?: string },
  ) {
    super();
  }
}

export class ListSharedCasesQuery extends Query<SharedCaseSummaryDto[]> {
  constructor(public readonly user: SessionUser) {
    super();
  }
}

export class ListCommentsQuery extends Query<CommentDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
  ) {
    super();
  }
}

export class ListPhotoRequestsQuery extends Query<PhotoRequestDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
  ) {
    super();
  }
}
