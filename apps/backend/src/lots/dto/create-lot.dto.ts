import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { IsId, IsWholeNumber } from '../../common/validators';
import { LOT_QUANTITY_MAX, lotQuantityMessage } from '../../products/dto/sampling-plan-query.dto';

export class CreateLotDto {
  @ApiProperty()
  @IsId({ message: 'productId must be the id of a product' })
  readonly productId: number;

  @ApiProperty({ example: 'PO-2026-0412' })
  @IsString({ message: 'poNumber is required' })
  @MinLength(1, { message: 'poNumber is required' })
  @MaxLength(TEXT_MAX.reference, {
    message: `poNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly poNumber: string;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_MAX.reference, {
    message: `packingSlip must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly packingSlip?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_MAX.reference, {
    message: `supplierLotCode must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly supplierLotCode?: string | null;

  /** Units in the lot; a lot of one is inspected whole (ANSI/ASQ Z1.4 / ISO 2859-1). */
  @ApiProperty({ minimum: 1, example: 40 })
  @IsWholeNumber(1, LOT_QUANTITY_MAX, { message: lotQuantityMessage })
  readonly quantity: number;

  @ApiProperty({ example: 'spools', description: 'spools, kits … as on the packing slip' })
  @IsString({ message: 'unit is required' })
  @MinLength(1, { message: 'unit is required' })
  @MaxLength(TEXT_MAX.unit, { message: `unit must be at most ${TEXT_MAX.unit} characters` })
  readonly unit: string;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `notes must be at most ${TEXT_MAX.long} characters` })
  readonly notes?: string | null;

  /**
   * The clerk confirms a second delivery under a PO and packing slip already received
   * (without it the server answers 409 naming the lots already received).
   */
  @ApiPropertyOptional({
    description:
      'true to receive a PO and packing slip already received again (a back order under the same slip)',
  })
  @IsOptional()
  @IsBoolean({ message: 'receiveAgain must be true or false' })
  readonly receiveAgain?: boolean;
}

/** GET /api/lots/received-before: the lots already received under a PO and packing slip. */
export class ReceivedBeforeQueryDto {
  @ApiProperty({ example: 'PO-2026-0412' })
  @IsString({ message: 'poNumber is required' })
  @MinLength(1, { message: 'poNumber is required' })
  @MaxLength(TEXT_MAX.reference, {
    message: `poNumber must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly poNumber: string;

  @ApiProperty({ example: 'PS-77' })
  @IsString({ message: 'packingSlip is required' })
  @MinLength(1, { message: 'packingSlip is required' })
  @MaxLength(TEXT_MAX.reference, {
    message: `packingSlip must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly packingSlip: string;
}
