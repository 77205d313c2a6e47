import { IntersectionType, PartialType } from '@nestjs/swagger';

import { EditVersionDto } from '../../common/versioned-edit';
import { CreateInstrumentDto } from './create-instrument.dto';
import { OptionalFlag } from '../../common/dto-fields';

/** Changed fields of an instrument, made on the version the client loaded (a stale one: 409). */
export class UpdateInstrumentDto extends IntersectionType(
  PartialType(CreateInstrumentDto),
  EditVersionDto,
) {
  @OptionalFlag({ description: 'false retires the instrument; readings with it are refused' })
  readonly active?: boolean;
}
