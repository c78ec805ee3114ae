import { ApiProperty } from '@nestjs/swagger';
import { GROUP_ROLES, type GroupRole } from '@homeground/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn } from 'class-validator';

export class SetMemberDto {
  @ApiProperty({ example: 'juniper.okafor@example.org' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'must be an e-mail address' })
  email: string;

  @ApiProperty({ enum: GROUP_ROLES })
  @IsIn(GROUP_ROLES, { message: `must be one of ${GROUP_ROLES.join(', ')}` })
  role: GroupRole;
}
