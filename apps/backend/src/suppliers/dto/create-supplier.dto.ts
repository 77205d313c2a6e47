import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsEmail,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  MinLength,
  ValidateIf,
} from 'class-validator';
import { SUPPLIER_STATUSES, type SupplierStatus } from '../entities/supplier.entity';
import { OptionalOneOf } from '../../common/dto-fields';

export class CreateSupplierDto {
  @ApiProperty({ example: 'Northbank Cable Works' })
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(TEXT_MAX.supplierName, {
    message: `name must be at most ${TEXT_MAX.supplierName} characters`,
  })
  readonly name: string;

  @ApiProperty({ example: 'NBCW', description: 'Short unique code (letters, digits, - and _)' })
  @IsString()
  @Matches(new RegExp(`^[A-Za-z0-9][A-Za-z0-9_-]{0,${TEXT_MAX.supplierCode - 1}}$`), {
    message: `code must be 1 to ${TEXT_MAX.supplierCode} letters, digits, - or _`,
  })
  readonly code: string;

  @ApiPropertyOptional({ example: 'quality@northbank.example', nullable: true })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsEmail({}, { message: 'contactEmail must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly contactEmail?: string | null;

  @OptionalOneOf(SUPPLIER_STATUSES, { default: 'approved' })
  readonly status?: SupplierStatus;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `notes must be at most ${TEXT_MAX.long} characters` })
  readonly notes?: string | null;
}
