import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class RestoreInspectionStateDto {
  @ApiProperty({
    description: "What the supplier's corrective action was; at least 20 characters.",
  })
  @IsString({ message: 'reason must be text' })
  @MinLength(20, { message: 'reason must be at least 20 characters' })
  @MaxLength(TEXT_MAX.long, { message: `reason must be at most ${TEXT_MAX.long} characters` })
  readonly reason: string;
}
