import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional, ValidateNested } from 'class-validator';
import { LotIdList, OptionalCurrency, OptionalText } from '../../common/dto-fields';
import { ReturnCostsDto } from './return-costs.dto';

/** What `supplierNote` is, on a new return and an edit alike. */
export const SUPPLIER_NOTE = 'Why the goods come back, written for the supplier';

export class CreateReturnDto {
  @ApiProperty({ type: [Number], description: 'Rejected lots of one supplier' })
  @LotIdList('lotIds must name at least one lot')
  readonly lotIds: number[];

  @OptionalText(TEXT_MAX.reference, { description: "The supplier's return authorization number" })
  readonly rmaNumber?: string;

  @OptionalText(TEXT_MAX.long)
  readonly notes?: string;

  @OptionalText(TEXT_MAX.long, { description: SUPPLIER_NOTE })
  readonly supplierNote?: string;

  @OptionalCurrency({ description: 'ISO 4217 code; CURRENCY by default' })
  readonly currency?: string;

  @ApiPropertyOptional({ type: ReturnCostsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => ReturnCostsDto)
  readonly costs?: ReturnCostsDto;
}
