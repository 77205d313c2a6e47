import { PRODUCT_CONDUCTORS, TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsInt,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { ConductorDto } from './conductor.dto';
import { ProductPolicyDto } from './product-policy.dto';

/**
 * Supplier, SKU and kind stay as created (lots are filed under them). `conductors`, when
 * given, replaces the list; specs that go are kept inactive since lots and samples point at them.
 */
export class UpdateProductDto extends ProductPolicyDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'description cannot be empty' })
  @MinLength(1, { message: 'description cannot be empty' })
  @MaxLength(TEXT_MAX.description, {
    message: `description must be at most ${TEXT_MAX.description} characters`,
  })
  readonly description?: string;

  @ApiPropertyOptional({ type: [ConductorDto] })
  @IsOptional()
  @IsArray({ message: 'conductors must hold at least one conductor' })
  @ArrayMinSize(PRODUCT_CONDUCTORS.min, { message: 'conductors must hold at least one conductor' })
  @ArrayMaxSize(PRODUCT_CONDUCTORS.max, {
    message: `conductors can hold at most ${PRODUCT_CONDUCTORS.max} conductors`,
  })
  @ValidateNested({ each: true })
  @Type(() => ConductorDto)
  readonly conductors?: ConductorDto[];

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  readonly active?: boolean;

  @ApiProperty({
    description: 'The version of the product the edit was made on; a stale one gets 409',
  })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number' })
  @Max(2147483647, { message: 'version must be a whole number' })
  readonly version!: number;
}
