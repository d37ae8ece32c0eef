import { Body, Controller, Get, Patch } from '@nestjs/common';
import { UuidParam } from '../common/uuid-param.js';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiTags } from '@nestjs/swagger';
import type { UserDto, UserListResponse } from '@fuelwright/shared';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import type { SessionUser } from '../common/session-user.js';
import { ChangeRoleDto } from './dto/change-role.dto.js';
import { ChangeRoleCommand } from './commands/change-role.command.js';
import { ListUsersQuery } from './queries/list-users.query.js';

@ApiTags('users')
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  @Get()
  async list(): Promise<UserListResponse> {
    return { users: await this.queries.execute(new ListUsersQuery()) };
  }

  @Patch(':id/role')
  async changeRole(
    @CurrentUser() actor: SessionUser,
    @UuidParam('id', 'user') id: string,
    @Body() dto: ChangeRoleDto,
  ): Promise<{ user: UserDto }> {
    return { user: await this.commands.execute(new ChangeRoleCommand(actor.id, id, dto.role)) };
  }
}
