import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, Max, Min } from 'class-validator';
import { ListQueryDto, queryBoolean } from '../../common/paging';
import { INSTRUMENT_KINDS, type InstrumentKind } from '../entities/instrument.entity';

export class ListInstrumentsDto extends ListQueryDto {
  @ApiPropertyOptional({ enum: INSTRUMENT_KINDS })
  @IsOptional()
  @IsIn(INSTRUMENT_KINDS, { message: `kind must be one of ${INSTRUMENT_KINDS.join(', ')}` })
  readonly kind?: InstrumentKind;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'active must be true or false' })
  readonly active?: boolean;

  @ApiPropertyOptional({ description: 'Only instruments due within this many days, or overdue' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'dueWithinDays must be a whole number from 0 to 3650' })
  @Min(0, { message: 'dueWithinDays must be a whole number from 0 to 3650' })
  @Max(3650, { message: 'dueWithinDays must be a whole number from 0 to 3650' })
  readonly dueWithinDays?: number;
}
