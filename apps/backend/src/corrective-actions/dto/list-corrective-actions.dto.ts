import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional } from 'class-validator';
import { OptionalQueryId, StatusList } from '../../common/dto-fields';
import { ListQueryDto, queryBoolean } from '../../common/paging';
import { CAR_STATUSES } from '../entities/corrective-action.entity';

export class ListCorrectiveActionsDto extends ListQueryDto {
  @StatusList(CAR_STATUSES)
  readonly status?: string;

  @OptionalQueryId()
  readonly supplierId?: number;

  @ApiPropertyOptional({
    description: 'Only requests still awaiting the supplier past their due date',
  })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'overdue must be true or false' })
  readonly overdue?: boolean;
}
