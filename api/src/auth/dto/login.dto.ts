import { ApiProperty } from '@nestjs/swagger';
import type { LoginRequest } from '@homeground/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsNotEmpty, IsString } from 'class-validator';

export class LoginDto implements LoginRequest {
  @ApiProperty({ example: 'mara.ellsworth@example.org' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'must be an e-mail address' })
  email: string;

  @ApiProperty()
  @IsString({ message: 'must be text' })
  @IsNotEmpty({ message: 'must not be empty' })
  password: string;
}
