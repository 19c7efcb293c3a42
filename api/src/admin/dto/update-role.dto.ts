import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role, type UpdateRoleRequest } from '@peakwise/shared';
import { IsIn } from 'class-validator';

export class UpdateRoleDto implements UpdateRoleRequest {
  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `Choose one of: ${ROLES.join(', ')}.` })
  role: Role;
}
