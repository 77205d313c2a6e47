import { OptionalQueryId, QueryFlag, StatusList } from '../../common/dto-fields';
import { ListQueryDto } from '../../common/paging';
import { CAR_STATUSES } from '../entities/corrective-action.entity';

export class ListCorrectiveActionsDto extends ListQueryDto {
  @StatusList(CAR_STATUSES)
  readonly status?: string;

  @OptionalQueryId()
  readonly supplierId?: number;

  @QueryFlag({ description: 'Only requests still awaiting the supplier past their due date' })
  readonly overdue?: boolean;
}
