import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { ReturnCostsDto } from './return-costs.dto';

export class CreateReturnDto {
  @ApiProperty({ type: [Number], description: 'Rejected lots of one supplier' })
  @IsArray({ message: 'lotIds must be a list of lot ids' })
  @ArrayMinSize(1, { message: 'lotIds must name at least one lot' })
  @ArrayMaxSize(100, { message: 'lotIds can name at most 100 lots' })
  @ArrayUnique({ message: 'lotIds must not repeat a lot' })
  @IsInt({ each: true, message: 'each lot id must be a whole number' })
  @Min(1, { each: true, message: 'each lot id must be a whole number' })
  readonly lotIds: number[];

  @ApiPropertyOptional({ description: "The supplier's return authorization number" })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.reference, {
    message: `rmaNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly rmaNumber?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `notes must be at most ${TEXT_MAX.long} characters` })
  readonly notes?: string;

  @ApiPropertyOptional({ description: 'Why the goods come back, written for the supplier' })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `supplierNote must be at most ${TEXT_MAX.long} characters` })
  readonly supplierNote?: string;

  @ApiPropertyOptional({ example: 'EUR', description: 'ISO 4217 code; CURRENCY by default' })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'currency must be an ISO 4217 code such as EUR or USD' })
  readonly currency?: string;

  @ApiPropertyOptional({ type: ReturnCostsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => ReturnCostsDto)
  readonly costs?: ReturnCostsDto;
}
