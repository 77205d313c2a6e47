import { TEXT_MAX } from '@gaugeproof/api-types';
import { IsAcceptablePassword } from '../password-rules';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { EditVersionDto } from '../../common/versioned-edit';
import { IsBoolean, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../auth/roles';
import { OptionalOneOf } from '../../common/dto-fields';

/** Changed fields of an account, made on the version the admin loaded (a stale one: 409). */
export class UpdateUserDto extends EditVersionDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MinLength(1, { message: 'name cannot be empty' })
  @MaxLength(TEXT_MAX.name)
  readonly name?: string;

  @OptionalOneOf(ROLES)
  readonly role?: Role;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean()
  readonly active?: boolean;

  @ApiPropertyOptional({ minLength: 10, description: 'Sets a new password (reset).' })
  @IsOptional()
  @IsAcceptablePassword()
  readonly password?: string;
}
