import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { ReturnCostsDto } from './return-costs.dto';

/** An edit of a return, made on the copy the client loaded (`version`). */
export class UpdateReturnDto {
  @ApiProperty({ description: 'The version the edit was made on; a stale one gets 409' })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number' })
  readonly version: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.reference, {
    message: `rmaNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly rmaNumber?: string;

  @ApiPropertyOptional({ description: "Purchasing's own notes; never sent to the supplier" })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `notes must be at most ${TEXT_MAX.long} characters` })
  readonly notes?: string;

  @ApiPropertyOptional({ description: 'Why the goods come back, written for the supplier' })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `supplierNote must be at most ${TEXT_MAX.long} characters` })
  readonly supplierNote?: string;

  @ApiPropertyOptional({ description: "Put the QA lead's reason in the supplier's documents" })
  @IsOptional()
  @IsBoolean({ message: 'shareDecisionReason must be true or false' })
  readonly shareDecisionReason?: boolean;

  @ApiPropertyOptional({ type: ReturnCostsDto, description: 'Replaces the costs (draft only)' })
  @IsOptional()
  @ValidateNested()
  @Type(() => ReturnCostsDto)
  readonly costs?: ReturnCostsDto;

  @ApiPropertyOptional({ example: 'EUR', description: 'ISO 4217 code (draft only)' })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'currency must be an ISO 4217 code such as EUR or USD' })
  readonly currency?: string;

  @ApiPropertyOptional({
    type: [Number],
    description: 'The lots on the return, replacing the list (draft only)',
  })
  @IsOptional()
  @IsArray({ message: 'lotIds must be a list of lot ids' })
  @ArrayMinSize(1, { message: 'lotIds must name at least one lot; cancel the return instead' })
  @ArrayMaxSize(100, { message: 'lotIds can name at most 100 lots' })
  @ArrayUnique({ message: 'lotIds must not repeat a lot' })
  @IsInt({ each: true, message: 'each lot id must be a whole number' })
  @Min(1, { each: true, message: 'each lot id must be a whole number' })
  readonly lotIds?: number[];
}
