import { ApiProperty } from '@nestjs/swagger';
import { GLOBAL_ROLES, type GlobalRole } from '@homeground/shared';
import { IsIn } from 'class-validator';

export class SetRoleDto {
  @ApiProperty({ enum: GLOBAL_ROLES })
  @IsIn(GLOBAL_ROLES, { message: `must be one of ${GLOBAL_ROLES.join(', ')}` })
  role: GlobalRole;
}
