import { Query } from '@nestjs/cqrs';
import type { UserDto } from '@fuelwright/shared';

export class ListUsersQuery extends Query<UserDto[]> {}
