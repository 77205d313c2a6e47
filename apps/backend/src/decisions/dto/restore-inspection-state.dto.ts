import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class RestoreInspectionStateDto {
  @ApiProperty({
    description: "What the supplier's corrective action was; at least 20 characters.",
  })
  @IsString({ message: 'reason must be text' })
  @MinLength(20, { message: 'reason must be at least 20 characters' })
  @MaxLength(4000, { message: 'reason must be at most 4000 characters' })
  readonly reason: string;
}
