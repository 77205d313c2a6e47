import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { ListQueryDto } from '../../common/paging';
import { SUPPLIER_STATUSES, type SupplierStatus } from '../entities/supplier.entity';
import { OptionalOneOf } from '../../common/dto-fields';

export class ListSuppliersDto extends ListQueryDto {
  @ApiPropertyOptional({ description: 'Text in the name, code or contact e-mail' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  readonly q?: string;

  @OptionalOneOf(SUPPLIER_STATUSES)
  readonly status?: SupplierStatus;
}
