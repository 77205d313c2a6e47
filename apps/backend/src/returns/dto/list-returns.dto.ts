import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Matches, Min } from 'class-validator';
import { ListQueryDto } from '../../common/paging';
import { RETURN_STATUSES } from '../entities/vendor-return.entity';

export class ListReturnsDto extends ListQueryDto {
  @ApiPropertyOptional({ description: `Comma list of ${RETURN_STATUSES.join(', ')}` })
  @IsOptional()
  @Matches(new RegExp(`^(${RETURN_STATUSES.join('|')})(,(${RETURN_STATUSES.join('|')}))*$`), {
    message: `status must be a comma list of ${RETURN_STATUSES.join(', ')}`,
  })
  readonly status?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'supplierId must be a whole number' })
  @Min(1, { message: 'supplierId must be a whole number' })
  readonly supplierId?: number;
}
