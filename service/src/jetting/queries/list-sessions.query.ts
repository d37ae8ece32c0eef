import { Query } from '@nestjs/cqrs';
import type { JettingSessionDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class ListSessionsQuery extends Query<JettingSessionDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
  ) {
    super();
  }
}
