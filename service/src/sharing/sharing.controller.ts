import { Body, Controller, Delete, Get, HttpCode, Post, Query as QueryParams, UseGuards } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiPropertyOptional, ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { IsOptional, IsUUID } from 'class-validator';
import type { AcceptInvitationResponse, CaseDto, CommentDto, PhotoRequestDto, ShareDto, ShareListResponse, SharedCaseSummaryDto } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import type { SessionUser } from '../common/session-user.js';
import { AcceptInvitationDto, CreateCommentDto, CreateShareDto, RecommendCheckDto, RequestPhotoDto } from './dto/sharing.dto.js';
import { AcceptInvitationCommand } from './commands/accept-invitation.command.js';
import { AddCommentCommand } from './commands/add-comment.command.js';
import { CreateShareCommand } from './commands/create-share.command.js';
import { RecommendCheckCommand } from './commands/recommend-check.command.js';
import { RequestPhotoCommand } from './commands/request-photo.command.js';
import { RevokeShareCommand } from './commands/revoke-share.command.js';
import { ListCommentsQuery, ListPhotoRequestsQuery, ListSharedCasesQuery, ListSharesQuery } from './queries/review.queries.js';

class ListSharesDto {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'kartId must be a kart id' }) kartId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'caseId must be a case id' }) caseId?: string;
}

@ApiTags('sharing')
@Controller()
export class SharingController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Post('shares')
  @UseGuards(ThrottlerGuard)
  share(@CurrentUser() user: SessionUser, @Body() dto: CreateShareDto): Promise<ShareDto> {
    return this.commands.execute(new CreateShareCommand(user, dto));
  }

  @Get('shares')
  async shares(@CurrentUser() user: SessionUser, @QueryParams() q: ListSharesDto): Promise<ShareListResponse> {
    return { shares: await this.queries.execute(new ListSharesQuery(user, q)) };
  }

  @Delete('shares/:id')
  revoke(@CurrentUser() user: SessionUser, @UuidParam('id', 'share') id: string): Promise<ShareDto> {
    return this.commands.execute(new RevokeShareCommand(user, id));
  }

  @Post('invitations/accept')
  @HttpCode(200)
  @UseGuards(ThrottlerGuard)
  accept(@CurrentUser() user: SessionUser, @Body() dto: AcceptInvitationDto): Promise<AcceptInvitationResponse> {
    return this.commands.execute(new AcceptInvitationCommand(user, dto.token));
  }

  /** Any account that accepted a share: the share grants access, not the role. */
  @Get('shared-cases')
  async sharedCases(@CurrentUser() user: SessionUser): Promise<{ cases: SharedCaseSummaryDto[] }> {
    return { cases: await this.queries.execute(new ListSharedCasesQuery(user)) };
  }

  @Get('cases/:id/comments')
  async comments(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string): Promise<{ comments: CommentDto[] }> {
    return { comments: await this.queries.execute(new ListCommentsQuery(user, id)) };
  }

  @Post('cases/:id/comments')
  comment(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: CreateCommentDto): Promise<CommentDto> {
    return this.commands.execute(new AddCommentCommand(user, id, dto.body));
  }

  @Post('cases/:id/recommendations')
  @HttpCode(200)
  recommend(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: RecommendCheckDto): Promise<CaseDto> {
    return this.commands.execute(new RecommendCheckCommand(user, id, dto.checkId, dto.reason));
  }

  @Get('cases/:id/photo-requests')
  async photoRequests(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string): Promise<{ requests: PhotoRequestDto[] }> {
    return { requests: await this.queries.execute(new ListPhotoRequestsQuery(user, id)) };
  }

  @Post('cases/:id/photo-requests')
  requestPhoto(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string, @Body() dto: RequestPhotoDto): Promise<PhotoRequestDto> {
    return this.commands.execute(new RequestPhotoCommand(user, id, dto.what, dto.checkId));
  }
}
