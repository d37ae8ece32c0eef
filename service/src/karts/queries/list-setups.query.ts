import { Query } from '@nestjs/cqrs';
import type { SetupDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class ListSetupsQuery extends Query<SetupDto[]> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
  ) {
    super();
  }
}
