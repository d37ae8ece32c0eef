import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { CasesModule } from '../cases/cases.module.js';
import { SharingController } from './sharing.controller.js';
import { ReviewContext } from './review-context.js';
import { AcceptInvitationHandler } from './commands/accept-invitation.handler.js';
import { AddCommentHandler } from './commands/add-comment.handler.js';
import { CreateShareHandler } from './commands/create-share.handler.js';
import { RecommendCheckHandler } from './commands/recommend-check.handler.js';
import { RequestPhotoHandler } from './commands/request-photo.handler.js';
import { RevokeShareHandler } from './commands/revoke-share.handler.js';
import { ListCommentsHandler } from './queries/list-comments.handler.js';
import { ListPhotoRequestsHandler } from './queries/list-photo-requests.handler.js';
import { ListSharedCasesHandler } from './queries/list-shared-cases.handler.js';
import { ListSharesHandler } from './queries/list-shares.handler.js';

const handlers = [
  CreateShareHandler,
  RevokeShareHandler,
  AcceptInvitationHandler,
  AddCommentHandler,
  RecommendCheckHandler,
  RequestPhotoHandler,
  ListSharesHandler,
  ListSharedCasesHandler,
  ListCommentsHandler,
  ListPhotoRequestsHandler,
];

@Module({
  imports: [AuthModule, CasesModule],
  controllers: [SharingController],
  providers: [ReviewContext, ...handlers],
  exports: [ReviewContext],
})
export class SharingModule {}
