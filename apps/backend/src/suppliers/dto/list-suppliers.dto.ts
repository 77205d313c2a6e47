import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { ListQueryDto } from '../../common/paging';
import { SUPPLIER_STATUSES, type SupplierStatus } from '../entities/supplier.entity';

export class ListSuppliersDto extends ListQueryDto {
  @ApiPropertyOptional({ description: 'Text in the name, code or contact e-mail' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  readonly q?: string;

  @ApiPropertyOptional({ enum: SUPPLIER_STATUSES })
  @IsOptional()
  @IsIn(SUPPLIER_STATUSES, { message: `status must be one of ${SUPPLIER_STATUSES.join(', ')}` })
  readonly status?: SupplierStatus;
}
