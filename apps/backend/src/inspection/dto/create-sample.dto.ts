import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';

export class CreateSampleDto {
  @ApiProperty({ description: 'Conductor of the lot’s product the sample is cut for' })
  @IsInt({ message: 'conductorId must be a whole-number conductor id' })
  readonly conductorId: number;

  @ApiPropertyOptional({ description: 'Spool number, kit serial … the unit it was cut from' })
  @IsOptional()
  @IsString({ message: 'unitRef must be text' })
  @MaxLength(TEXT_MAX.reference, {
    message: `unitRef must be at most ${TEXT_MAX.reference} characters`,
  })
  readonly unitRef?: string;

  @ApiPropertyOptional({ description: 'Unit number 1..n of the plan; next free unit if omitted' })
  @IsOptional()
  @IsInt({ message: 'seq must be a whole unit number of at least 1' })
  @Min(1, { message: 'seq must be a whole unit number of at least 1' })
  @Max(100_000, { message: 'seq must be at most 100000' })
  readonly seq?: number;

  @ApiPropertyOptional({
    description: 'A UUID the client made; a repeat is answered with the sample it made first',
    example: '9b2f6a52-0c3e-4e1f-9a57-2f1d3c4b5a69',
  })
  @IsOptional()
  @IsUUID('all', { message: 'clientId must be a UUID' })
  readonly clientId?: string;
}
