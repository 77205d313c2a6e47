import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { IsId } from '../../common/validators';
import { ListQueryDto, queryBoolean } from '../../common/paging';
import { PRODUCT_KINDS, type ProductKind } from '../entities/product.entity';

export class ListProductsDto extends ListQueryDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsId({ message: 'supplierId must be the id of a supplier' })
  readonly supplierId?: number;

  @ApiPropertyOptional({ enum: PRODUCT_KINDS })
  @IsOptional()
  @IsIn(PRODUCT_KINDS, { message: `kind must be one of ${PRODUCT_KINDS.join(', ')}` })
  readonly kind?: ProductKind;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'active must be true or false' })
  readonly active?: boolean;

  @ApiPropertyOptional({ description: 'Text in the SKU, description or supplier name' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  readonly q?: string;
}
