import { TEXT_MAX } from '@gaugeproof/api-types';
import { IsAcceptablePassword } from '../password-rules';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, MaxLength } from 'class-validator';
import { ROLES, type Role } from '../../auth/roles';
import { OneOf, RequiredName } from '../../common/dto-fields';

export class CreateUserDto {
  @ApiProperty()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly email: string;

  @RequiredName(TEXT_MAX.name)
  readonly name: string;

  @OneOf(ROLES)
  readonly role: Role;

  @ApiProperty({ minLength: 10 })
  @IsAcceptablePassword()
  readonly password: string;
}
