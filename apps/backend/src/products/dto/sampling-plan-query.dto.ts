import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsWholeNumber } from '../../common/validators';

/** The sampling tables (Table I, MIL-STD-105E) start at a lot of 2 units. */
export const LOT_QUANTITY_MESSAGE = 'quantity must be a whole number of at least 2';
/** Far above any delivery; keeps the number exact (common practice, no source). */
export const LOT_QUANTITY_MAX = 10_000_000;

export function lotQuantityMessage(args: { value: unknown }): string {
  return typeof args.value === 'number' && args.value > LOT_QUANTITY_MAX
    ? `quantity must be at most ${LOT_QUANTITY_MAX}`
    : LOT_QUANTITY_MESSAGE;
}

export class SamplingPlanQueryDto {
  @ApiProperty({ minimum: 2, maximum: LOT_QUANTITY_MAX, example: 500 })
  @Type(() => Number)
  @IsWholeNumber(2, LOT_QUANTITY_MAX, { message: lotQuantityMessage })
  readonly quantity: number;
}
