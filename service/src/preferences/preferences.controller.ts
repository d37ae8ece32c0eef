import { Body, Controller, Get, Put } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiCookieAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { UserPreferences } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { SESSION_COOKIE, type SessionUser } from '../common/session-user.js';
import { PreferencesDto } from './dto/preferences.dto.js';
import { GetPreferencesQuery } from './queries/get-preferences.query.js';
import { SavePreferencesCommand } from './commands/save-preferences.command.js';

@ApiTags('preferences')
@ApiCookieAuth(SESSION_COOKIE)
@Controller('me')
export class PreferencesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get('preferences')
  @ApiOperation({ summary: 'Your display units (the API itself always speaks °C, hPa and metres)' })
  get(@CurrentUser() user: SessionUser): Promise<UserPreferences> {
    return this.queries.execute(new GetPreferencesQuery(user.id));
  }

  @Put('preferences')
  @ApiOperation({ summary: 'Save your display units' })
  save(@CurrentUser() user: SessionUser, @Body() dto: PreferencesDto): Promise<UserPreferences> {
    return this.commands.execute(new SavePreferencesCommand(user.id, dto));
  }
}
