import { Command } from '@nestjs/cqrs';
import type { CommentDto } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class AddCommentCommand extends Command<CommentDto> {
  constructor(
    public readonly user: SessionUser,
    public readonly caseId: string,
    public readonly body: string,
  ) {
    super();
  }
}
