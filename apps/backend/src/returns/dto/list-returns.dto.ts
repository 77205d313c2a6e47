import { OptionalQueryId, StatusList } from '../../common/dto-fields';
import { ListQueryDto } from '../../common/paging';
import { RETURN_STATUSES } from '../entities/vendor-return.entity';

export class ListReturnsDto extends ListQueryDto {
  @StatusList(RETURN_STATUSES)
  readonly status?: string;

  @OptionalQueryId()
  readonly supplierId?: number;
}
