import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { IsId } from '../../common/validators';
import { PRODUCT_KINDS, type ProductKind } from '../entities/product.entity';
import { ConductorDto, ConductorList } from './conductor.dto';
import { ProductPolicyDto } from './product-policy.dto';
import { OneOf } from '../../common/dto-fields';

export class CreateProductDto extends ProductPolicyDto {
  @ApiProperty()
  @Type(() => Number)
  @IsId({ message: 'supplierId must be the id of a supplier' })
  readonly supplierId: number;

  @ApiProperty({ example: 'PC-4-50R' })
  @IsString({ message: 'sku is required' })
  @Matches(/^\S(.{0,62}\S)?$/, { message: 'sku must be 1 to 64 characters, no spaces at the ends' })
  readonly sku: string;

  @OneOf(PRODUCT_KINDS)
  readonly kind: ProductKind;

  @ApiProperty({ example: '4 AWG power cable, red, 50 m spool' })
  @IsString({ message: 'description is required' })
  @MinLength(1, { message: 'description is required' })
  @MaxLength(TEXT_MAX.description, {
    message: `description must be at most ${TEXT_MAX.description} characters`,
  })
  readonly description: string;

  @ApiProperty({ type: [ConductorDto] })
  @ConductorList()
  readonly conductors: ConductorDto[];
}
