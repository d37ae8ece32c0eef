import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiTags } from '@nestjs/swagger';
import type { KartDto, KartListResponse, SetupDto, SetupListResponse } from '@fuelwright/shared';
import { RecordSetupDto } from './dto/setup.dto.js';
import { RecordSetupCommand } from './commands/record-setup.command.js';
import { ListSetupsQuery } from './queries/list-setups.query.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import type { SessionUser } from '../common/session-user.js';
import { CreateKartDto, UpdateKartDto } from './dto/kart.dto.js';
import { CreateKartCommand } from './commands/create-kart.command.js';
import { DeleteKartCommand } from './commands/delete-kart.command.js';
import { UpdateKartCommand } from './commands/update-kart.command.js';
import { GetKartQuery } from './queries/get-kart.query.js';
import { ListKartsQuery } from './queries/list-karts.query.js';

@ApiTags('karts')
@Controller('karts')
export class KartsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get()
  async list(@CurrentUser() user: SessionUser): Promise<KartListResponse> {
    return { karts: await this.queries.execute(new ListKartsQuery(user)) };
  }

  @Post()
  create(@CurrentUser() user: SessionUser, @Body() dto: CreateKartDto): Promise<KartDto> {
    return this.commands.execute(new CreateKartCommand(user, dto));
  }

  @Get(':id')
  get(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string): Promise<KartDto> {
    return this.queries.execute(new GetKartQuery(user, id));
  }

  @Patch(':id')
  update(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string, @Body() dto: UpdateKartDto): Promise<KartDto> {
    return this.commands.execute(new UpdateKartCommand(user, id, dto));
  }

  @Delete(':id')
  @HttpCode(204)
  async remove(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string): Promise<void> {
    await this.commands.execute(new DeleteKartCommand(user, id));
  }

  @Get(':id/setups')
  async setups(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string): Promise<SetupListResponse> {
    return { setups: await this.queries.execute(new ListSetupsQuery(user, id)) };
  }

  @Post(':id/setups')
  recordSetup(@CurrentUser() user: SessionUser, @UuidParam('id', 'kart') id: string, @Body() dto: RecordSetupDto): Promise<SetupDto> {
    return this.commands.execute(new RecordSetupCommand(user, id, dto));
  }
}
