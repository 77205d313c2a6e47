import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { IsDay, RequiredText } from '../../common/dto-fields';

/** The supplier's answer, through its link. */
export class SupplierResponseDto {
  @RequiredText(TEXT_MIN.answer, TEXT_MAX.long, {
    description: 'What was done with suspect stock, here and in transit',
  })
  readonly containment: string;

  @RequiredText(TEXT_MIN.answer, TEXT_MAX.long)
  readonly rootCause: string;

  @RequiredText(TEXT_MIN.answer, TEXT_MAX.long)
  readonly correctiveAction: string;

  @ApiProperty({ example: '2026-12-31', description: 'When the fix is in place' })
  @IsDay()
  readonly promisedOn: string;
}
