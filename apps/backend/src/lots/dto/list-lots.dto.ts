import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { IsCalendarDate, IsId } from '../../common/validators';
import { ListQueryDto } from '../../common/paging';
import { LOT_STATUSES, type LotStatus } from '../entities/lot.entity';

const DATE_MESSAGE = (field: string) => `${field} must be a date written YYYY-MM-DD`;

/** Filters of the lot list and its CSV export (docs/api-conventions.md). */
export class LotFiltersDto extends ListQueryDto {
  @ApiPropertyOptional({ description: 'Comma list, e.g. on_hold,inspecting' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string'
      ? value
          .split(',')
          .map((s) => s.trim())
          .filter(Boolean)
      : value,
  )
  @IsIn(LOT_STATUSES, {
    each: true,
    message: `status must be a comma list of ${LOT_STATUSES.join(', ')}`,
  })
  readonly status?: LotStatus[];

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsId({ message: 'supplierId must be the id of a supplier' })
  readonly supplierId?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsId({ message: 'productId must be the id of a product' })
  readonly productId?: number;

  @ApiPropertyOptional({ description: 'First day received, YYYY-MM-DD (UTC), inclusive' })
  @IsOptional()
  @IsCalendarDate({ message: DATE_MESSAGE('receivedFrom') })
  readonly receivedFrom?: string;

  @ApiPropertyOptional({ description: 'Last day received, YYYY-MM-DD (UTC), inclusive' })
  @IsOptional()
  @IsCalendarDate({ message: DATE_MESSAGE('receivedTo') })
  readonly receivedTo?: string;

  @ApiPropertyOptional({ description: 'PO, packing slip, supplier lot code, SKU or supplier name' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  readonly q?: string;
}
