import { TEXT_MAX } from '@gaugeproof/api-types';
import { IsAcceptablePassword } from '../password-rules';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../auth/roles';

export class CreateUserDto {
  @ApiProperty()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly email: string;

  @ApiProperty()
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(TEXT_MAX.name)
  readonly name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  readonly role: Role;

  @ApiProperty({ minLength: 10 })
  @IsAcceptablePassword()
  readonly password: string;
}
