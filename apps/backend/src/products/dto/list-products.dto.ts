import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { IsId } from '../../common/validators';
import { ListQueryDto } from '../../common/paging';
import { PRODUCT_KINDS, type ProductKind } from '../entities/product.entity';
import { OptionalOneOf, QueryFlag } from '../../common/dto-fields';

export class ListProductsDto extends ListQueryDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsId({ message: 'supplierId must be the id of a supplier' })
  readonly supplierId?: number;

  @OptionalOneOf(PRODUCT_KINDS)
  readonly kind?: ProductKind;

  @QueryFlag()
  readonly active?: boolean;

  @ApiPropertyOptional({ description: 'Text in the SKU, description or supplier name' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  readonly q?: string;
}
