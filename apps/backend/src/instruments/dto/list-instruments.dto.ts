import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';
import { ListQueryDto } from '../../common/paging';
import { INSTRUMENT_KINDS, type InstrumentKind } from '../entities/instrument.entity';
import { OptionalOneOf, QueryFlag } from '../../common/dto-fields';

export class ListInstrumentsDto extends ListQueryDto {
  @OptionalOneOf(INSTRUMENT_KINDS)
  readonly kind?: InstrumentKind;

  @QueryFlag()
  readonly active?: boolean;

  @ApiPropertyOptional({ description: 'Only instruments due within this many days, or overdue' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'dueWithinDays must be a whole number from 0 to 3650' })
  @Min(0, { message: 'dueWithinDays must be a whole number from 0 to 3650' })
  @Max(3650, { message: 'dueWithinDays must be a whole number from 0 to 3650' })
  readonly dueWithinDays?: number;
}
