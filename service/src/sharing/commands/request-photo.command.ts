import { Command } from '@nestjs/cqrs';
import type { PhotoRequestDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class RequestPhotoCommand extends Command<PhotoRequestDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly what: string,
    public readonly checkId: string | undefined,
  ) {
    super();
  }
}
