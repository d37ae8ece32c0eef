import { Query } from '@nestjs/cqrs';
import type { KartDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class GetKartQuery extends Query<KartDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
  ) {
    super();
  }
}
