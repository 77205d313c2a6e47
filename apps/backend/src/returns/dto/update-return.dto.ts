import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsOptional, ValidateNested } from 'class-validator';
import {
  LotIdList,
  OptionalCurrency,
  OptionalFlag,
  OptionalText,
  StepVersion,
} from '../../common/dto-fields';
import { SUPPLIER_NOTE } from './create-return.dto';
import { ReturnCostsDto } from './return-costs.dto';

/** An edit of a return, made on the copy the client loaded (`version`). */
export class UpdateReturnDto {
  @StepVersion('The version the edit was made on; a stale one gets 409')
  readonly version: number;

  @OptionalText(TEXT_MAX.reference)
  readonly rmaNumber?: string;

  @OptionalText(TEXT_MAX.long, {
    description: "Purchasing's own notes; never sent to the supplier",
  })
  readonly notes?: string;

  @OptionalText(TEXT_MAX.long, { description: SUPPLIER_NOTE })
  readonly supplierNote?: string;

  @OptionalFlag({ description: "Put the QA lead's reason in the supplier's documents" })
  readonly shareDecisionReason?: boolean;

  @ApiPropertyOptional({ type: ReturnCostsDto, description: 'Replaces the costs (draft only)' })
  @IsOptional()
  @ValidateNested()
  @Type(() => ReturnCostsDto)
  readonly costs?: ReturnCostsDto;

  @OptionalCurrency({ description: 'ISO 4217 code (draft only)' })
  readonly currency?: string;

  @ApiPropertyOptional({
    type: [Number],
    description: 'The lots on the return, replacing the list (draft only)',
  })
  @IsOptional()
  @LotIdList('lotIds must name at least one lot; cancel the return instead')
  readonly lotIds?: number[];
}
