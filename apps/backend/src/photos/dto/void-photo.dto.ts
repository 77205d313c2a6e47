import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class VoidPhotoDto {
  @ApiProperty({ description: 'Why the photo must not count (at least 10 characters)' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'reason must be text' })
  @MinLength(TEXT_MIN.voidReason, {
    message: `reason must be at least ${TEXT_MIN.voidReason} characters: say why the photo must not count`,
  })
  @MaxLength(TEXT_MAX.reason, { message: `reason must be at most ${TEXT_MAX.reason} characters` })
  readonly reason: string;
}
