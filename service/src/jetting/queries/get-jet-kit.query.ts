import { Query } from '@nestjs/cqrs';
import type { JetKitResponse } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class GetJetKitQuery extends Query<JetKitResponse> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
  ) {
    super();
  }
}
