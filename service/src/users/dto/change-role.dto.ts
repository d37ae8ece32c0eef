import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ROLES, type ChangeRoleRequest, type Role } from '@fuelwright/shared';

export class ChangeRoleDto implements ChangeRoleRequest {
  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: Role;
}
