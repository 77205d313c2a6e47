import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class VoidPhotoDto {
  @ApiProperty({ description: 'Why the photo must not count (at least 10 characters)' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'reason must be text' })
  @MinLength(10, {
    message: 'reason must be at least 10 characters: say why the photo must not count',
  })
  @MaxLength(2000, { message: 'reason must be at most 2000 characters' })
  readonly reason: string;
}
