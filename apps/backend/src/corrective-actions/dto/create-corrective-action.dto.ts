import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { IsDay, IsWholeFromOne, LotIdList, RequiredText } from '../../common/dto-fields';

export class CreateCorrectiveActionDto {
  @ApiProperty()
  @IsWholeFromOne()
  readonly supplierId: number;

  @ApiProperty({ type: [Number], description: 'Lots of that supplier the problem was found on' })
  @LotIdList()
  readonly lotIds: number[];

  @RequiredText(TEXT_MIN.problem, TEXT_MAX.long, {
    description: 'What was found, at least 10 characters',
  })
  readonly problem: string;

  @ApiProperty({
    example: '2026-12-31',
    description: "The supplier's response is due (YYYY-MM-DD)",
  })
  @IsDay()
  readonly dueOn: string;
}
