import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, Max, Min } from 'class-validator';

const money = { maxDecimalPlaces: 2 };

export class ReturnCostsDto {
  @ApiPropertyOptional({ description: 'Hours spent sorting and inspecting the rejected lots' })
  @IsOptional()
  @IsNumber(money, { message: 'inspectionHours must be a number with at most 2 decimals' })
  @Min(0, { message: 'inspectionHours cannot be negative' })
  @Max(10_000, { message: 'inspectionHours must be at most 10000' })
  readonly inspectionHours?: number;

  @ApiPropertyOptional({ description: 'Charge per inspection hour' })
  @IsOptional()
  @IsNumber(money, { message: 'hourlyRate must be a number with at most 2 decimals' })
  @Min(0, { message: 'hourlyRate cannot be negative' })
  @Max(100_000, { message: 'hourlyRate must be at most 100000' })
  readonly hourlyRate?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(money, { message: 'freight must be a number with at most 2 decimals' })
  @Min(0, { message: 'freight cannot be negative' })
  @Max(10_000_000, { message: 'freight must be at most 10000000' })
  readonly freight?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber(money, { message: 'other must be a number with at most 2 decimals' })
  @Min(0, { message: 'other cannot be negative' })
  @Max(10_000_000, { message: 'other must be at most 10000000' })
  readonly other?: number;
}
