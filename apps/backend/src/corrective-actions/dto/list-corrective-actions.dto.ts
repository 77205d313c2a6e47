import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, Matches, Min } from 'class-validator';
import { ListQueryDto, queryBoolean } from '../../common/paging';
import { CAR_STATUSES } from '../entities/corrective-action.entity';

const ONE = CAR_STATUSES.join('|');

export class ListCorrectiveActionsDto extends ListQueryDto {
  @ApiPropertyOptional({ description: `Comma list of ${CAR_STATUSES.join(', ')}` })
  @IsOptional()
  @Matches(new RegExp(`^(${ONE})(,(${ONE}))*$`), {
    message: `status must be a comma list of ${CAR_STATUSES.join(', ')}`,
  })
  readonly status?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'supplierId must be a whole number' })
  @Min(1, { message: 'supplierId must be a whole number' })
  readonly supplierId?: number;

  @ApiPropertyOptional({
    description: 'Only requests still awaiting the supplier past their due date',
  })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'overdue must be true or false' })
  readonly overdue?: boolean;
}
