import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsPositive,
  IsUUID,
  Max,
  Min,
  ValidateIf,
} from 'class-validator';
import { READING_LIMITS as L } from '@gaugeproof/api-types';
import { READING_METHODS, type ReadingMethod } from '../entities/reading.entity';

const NUMBER = { allowNaN: false, allowInfinity: false } as const;
const STRAND_LIST = `strandDiametersMm must hold ${L.strandDiameters.min} to ${L.strandDiameters.max} strand diameters`;
const uses =
  (...methods: ReadingMethod[]) =>
  (o: { method?: unknown }) =>
    methods.includes(o.method as ReadingMethod);

/** Which input fields each method reads; anything else in the body is refused. */
export const METHOD_FIELDS: Record<ReadingMethod, readonly string[]> = {
  mass: ['massG', 'lengthMm', 'strandingIncrement'],
  strands: ['count', 'strandDiametersMm', 'strandDiameterMm'],
  resistance: ['resistanceOhm', 'lengthMm', 'temperatureC', 'strandingIncrement'],
  diameter: ['diameterMm'],
};
export const INPUT_FIELDS = [
  'massG',
  'lengthMm',
  'count',
  'strandDiameterMm',
  'strandDiametersMm',
  'resistanceOhm',
  'temperatureC',
  'diameterMm',
  'strandingIncrement',
] as const;

/**
 * One reading by one method. The fields a method needs are required for it only
 * (ValidateIf); the server recomputes every result from them.
 */
export class CreateReadingDto {
  @ApiProperty({ enum: READING_METHODS })
  @IsIn(READING_METHODS, { message: `method must be one of ${READING_METHODS.join(', ')}` })
  readonly method: ReadingMethod;

  @ApiPropertyOptional({ description: 'mass: stripped conductor mass, g', example: 76.1 })
  @ValidateIf(uses('mass'))
  @IsNumber(NUMBER, { message: 'massG must be a number of grams' })
  @IsPositive({ message: 'massG must be greater than 0 g' })
  readonly massG?: number;

  @ApiPropertyOptional({ description: 'mass and resistance: specimen length, mm', example: 1000 })
  @ValidateIf(uses('mass', 'resistance'))
  @IsNumber(NUMBER, { message: 'lengthMm must be a number of millimetres' })
  @Min(L.lengthMm.min, { message: `lengthMm must be at least ${L.lengthMm.min} mm` })
  @Max(L.lengthMm.max, {
    message: `lengthMm must be at most ${L.lengthMm.max} mm (${L.lengthMm.max / 1000} m)`,
  })
  readonly lengthMm?: number;

  @ApiPropertyOptional({ description: 'strands: number of strands counted', example: 420 })
  @ValidateIf(uses('strands'))
  @IsInt({ message: 'count must be a whole number of strands' })
  @Min(L.count.min, { message: `count must be at least ${L.count.min} strand` })
  @Max(L.count.max, { message: `count must be at most ${L.count.max} strands` })
  readonly count?: number;

  @ApiPropertyOptional({
    description: 'strands: diameter of one strand, mm (older form; prefer strandDiametersMm)',
    example: 0.254,
  })
  @ValidateIf((o: CreateReadingDto) => o.method === 'strands' && o.strandDiametersMm === undefined)
  @IsNumber(NUMBER, { message: 'strandDiameterMm must be a number of millimetres' })
  @IsPositive({ message: 'strandDiameterMm must be greater than 0 mm' })
  @Max(L.strandDiameterMm.max, {
    message: `strandDiameterMm must be at most ${L.strandDiameterMm.max} mm`,
  })
  readonly strandDiameterMm?: number;

  @ApiPropertyOptional({
    type: [Number],
    description:
      'strands: diameters of 1 to 10 strands, mm, each a different strand (three or more recommended)',
    example: [0.253, 0.254, 0.255],
  })
  @ValidateIf((o: CreateReadingDto) => o.strandDiametersMm !== undefined)
  @IsArray({ message: 'strandDiametersMm must be a list of strand diameters in mm' })
  @ArrayMinSize(L.strandDiameters.min, { message: STRAND_LIST })
  @ArrayMaxSize(L.strandDiameters.max, { message: STRAND_LIST })
  @IsNumber(NUMBER, { each: true, message: 'strandDiametersMm must hold numbers of millimetres' })
  @IsPositive({ each: true, message: 'each of strandDiametersMm must be greater than 0 mm' })
  @Max(L.strandDiameterMm.max, {
    each: true,
    message: `each of strandDiametersMm must be at most ${L.strandDiameterMm.max} mm`,
  })
  readonly strandDiametersMm?: number[];

  @ApiPropertyOptional({
    description: 'resistance: DC resistance in ohm (Ω, not mΩ: 0.78 mΩ is 0.00078)',
    example: 0.0008,
  })
  @ValidateIf(uses('resistance'))
  @IsNumber(NUMBER, { message: 'resistanceOhm must be a number of ohms' })
  @IsPositive({ message: 'resistanceOhm must be greater than 0 ohm' })
  readonly resistanceOhm?: number;

  @ApiPropertyOptional({ description: 'resistance: conductor temperature, °C', example: 21.5 })
  @ValidateIf(uses('resistance'))
  @IsNumber(NUMBER, { message: 'temperatureC must be a number of degrees Celsius' })
  @Min(L.temperatureC.min, { message: `temperatureC must be at least ${L.temperatureC.min} °C` })
  @Max(L.temperatureC.max, { message: `temperatureC must be at most ${L.temperatureC.max} °C` })
  readonly temperatureC?: number;

  @ApiPropertyOptional({
    description: 'diameter: diameter of a solid conductor, mm',
    example: 5.19,
  })
  @ValidateIf(uses('diameter'))
  @IsNumber(NUMBER, { message: 'diameterMm must be a number of millimetres' })
  @IsPositive({ message: 'diameterMm must be greater than 0 mm' })
  @Max(L.diameterMm.max, { message: `diameterMm must be at most ${L.diameterMm.max} mm` })
  readonly diameterMm?: number;

  @ApiPropertyOptional({
    description: 'mass and resistance: stranding increment k (0.02 = ASTM B496 2 %)',
    example: 0.02,
  })
  @IsOptional()
  @IsNumber(NUMBER, { message: 'strandingIncrement must be a number such as 0.02' })
  @Min(L.strandingIncrement.min, {
    message: `strandingIncrement must be at least ${L.strandingIncrement.min} (0 for a solid conductor)`,
  })
  @Max(L.strandingIncrement.max, {
    message: `strandingIncrement must be at most ${L.strandingIncrement.max} (it is a fraction: 0.02 = 2 %)`,
  })
  readonly strandingIncrement?: number;

  @ApiPropertyOptional({
    description:
      'resistance: true (default) for a four-wire (Kelvin) reading; a two-wire one is stored but decides nothing',
    example: true,
  })
  @IsOptional()
  @IsBoolean({ message: 'fourWire must be true or false' })
  readonly fourWire?: boolean;

  @ApiPropertyOptional({
    description:
      'true records a reading the plausibility checks question (e.g. ten times the nominal mass)',
    example: false,
  })
  @IsOptional()
  @IsBoolean({ message: 'confirmUnusual must be true or false' })
  readonly confirmUnusual?: boolean;

  @ApiProperty({ type: [Number], description: 'Registered instruments used', example: [1, 3] })
  @IsArray({ message: 'instrumentIds must be a list of instrument ids' })
  @ArrayMinSize(L.instruments.min, {
    message: 'instrumentIds must name at least the main instrument used',
  })
  @ArrayMaxSize(L.instruments.max, {
    message: `instrumentIds must name at most ${L.instruments.max} instruments`,
  })
  @IsInt({ each: true, message: 'instrumentIds must hold whole-number instrument ids' })
  readonly instrumentIds: number[];

  @ApiPropertyOptional({
    description: 'A UUID the client made; a repeat is answered with the reading it made first',
    example: '9b2f6a52-0c3e-4e1f-9a57-2f1d3c4b5a69',
  })
  @IsOptional()
  @IsUUID('all', { message: 'clientId must be a UUID' })
  readonly clientId?: string;
}
