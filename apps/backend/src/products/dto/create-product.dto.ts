import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsString,
  Matches,
  MaxLength,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { IsId } from '../../common/validators';
import { PRODUCT_KINDS, type ProductKind } from '../entities/product.entity';
import { ConductorDto } from './conductor.dto';
import { ProductPolicyDto } from './product-policy.dto';

export class CreateProductDto extends ProductPolicyDto {
  @ApiProperty()
  @Type(() => Number)
  @IsId({ message: 'supplierId must be the id of a supplier' })
  readonly supplierId: number;

  @ApiProperty({ example: 'PC-4-50R' })
  @IsString({ message: 'sku is required' })
  @Matches(/^\S(.{0,62}\S)?$/, { message: 'sku must be 1 to 64 characters, no spaces at the ends' })
  readonly sku: string;

  @ApiProperty({ enum: PRODUCT_KINDS })
  @IsIn(PRODUCT_KINDS, { message: `kind must be one of ${PRODUCT_KINDS.join(', ')}` })
  readonly kind: ProductKind;

  @ApiProperty({ example: '4 AWG power cable, red, 50 m spool' })
  @IsString({ message: 'description is required' })
  @MinLength(1, { message: 'description is required' })
  @MaxLength(300, { message: 'description must be at most 300 characters' })
  readonly description: string;

  @ApiProperty({ type: [ConductorDto] })
  @IsArray({ message: 'conductors must hold at least one conductor' })
  @ArrayMinSize(1, { message: 'conductors must hold at least one conductor' })
  @ArrayMaxSize(12, { message: 'conductors can hold at most 12 conductors' })
  @ValidateNested({ each: true })
  @Type(() => ConductorDto)
  readonly conductors: ConductorDto[];
}
