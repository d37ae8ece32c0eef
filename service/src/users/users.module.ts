import { Module } from '@nestjs/common';
import { UsersController } from './users.controller.js';
import { ChangeRoleHandler } from './commands/change-role.handler.js';
import { ListUsersHandler } from './queries/list-users.handler.js';

const handlers = [ChangeRoleHandler, ListUsersHandler];

@Module({ controllers: [UsersController], providers: handlers })
export class UsersModule {}
