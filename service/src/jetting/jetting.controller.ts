import { Body, Controller, Delete, Get, HttpCode, Post, Put } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiConflictResponse, ApiCookieAuth, ApiNotFoundResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { JetKitResponse, JetSuggestionResponse, JettingSessionDto, JettingSessionListResponse } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import { SESSION_COOKIE, type SessionUser } from '../common/session-user.js';
import { LogSessionDto } from './dto/log-session.dto.js';
import { JetKitDto, toJetKit } from './dto/jet-kit.dto.js';
import { JetSuggestionDto } from './dto/jet-suggestion.dto.js';
import { LogSessionCommand } from './commands/log-session.command.js';
import { DeleteSessionCommand } from './commands/delete-session.command.js';
import { SaveJetKitCommand } from './commands/save-jet-kit.command.js';
import { ListSessionsQuery } from './queries/list-sessions.query.js';
import { GetJetKitQuery } from './queries/get-jet-kit.query.js';
import { SuggestJetsQuery } from './queries/suggest-jets.query.js';

@ApiTags('jetting')
@ApiCookieAuth(SESSION_COOKIE)
@ApiNotFoundResponse({ description: 'No such kart (or not yours)' })
@Controller('karts')
export class JettingController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get(':id/sessions')
  @ApiOperation({ summary: 'The jetting log of a kart, newest first' })
  async sessions(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string): Promise<JettingSessionListResponse> {
    return { sessions: await this.queries.execute(new ListSessionsQuery(user, id)) };
  }

  @Post(':id/sessions')
  @ApiOperation({ summary: 'Log a session: the day’s air (densities are computed and stored), the jets, how it ran' })
  logSession(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string, @Body() dto: LogSessionDto): Promise<JettingSessionDto> {
    return this.commands.execute(new LogSessionCommand(user, id, dto));
  }

  @Delete(':id/sessions/:sessionId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a wrongly entered session' })
  async deleteSession(
    @CurrentUser() user: SessionUser,
    @UuidParam('id', 'kart') id: string,
    @UuidParam('sessionId', 'session') sessionId: string,
  ): Promise<void> {
    await this.commands.execute(new DeleteSessionCommand(user, id, sessionId));
  }

  @Get(':id/jet-kit')
  @ApiOperation({ summary: 'How this kart’s jet numbers scale and which sizes are held (a default until saved)' })
  jetKit(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string): Promise<JetKitResponse> {
    return this.queries.execute(new GetJetKitQuery(user, id));
  }

  @Put(':id/jet-kit')
  @ApiOperation({ summary: 'Save the jet kit' })
  saveJetKit(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string, @Body() dto: JetKitDto): Promise<JetKitResponse> {
    return this.commands.execute(new SaveJetKitCommand(user, id, toJetKit(dto)));
  }

  @Post(':id/jet-suggestion')
  @HttpCode(200)
  @ApiOperation({ summary: 'Suggest today’s main and pilot jets from the sessions that ran right' })
  @ApiConflictResponse({ description: 'No session of this kart ran right yet' })
  suggest(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string, @Body() dto: JetSuggestionDto): Promise<JetSuggestionResponse> {
    return this.queries.execute(new SuggestJetsQuery(user, id, dto));
  }
}
