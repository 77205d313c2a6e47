import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, MaxLength } from 'class-validator';

/** The text fields of the multipart upload; the image itself is the `file` field. */
export class UploadPhotoDto {
  @ApiPropertyOptional({ description: 'Sample of this lot the photo shows' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'sampleId must be a whole-number sample id' })
  readonly sampleId?: number;

  @ApiPropertyOptional({ maxLength: 300 })
  @IsOptional()
  @IsString({ message: 'caption must be text' })
  @MaxLength(TEXT_MAX.description, {
    message: `caption must be at most ${TEXT_MAX.description} characters`,
  })
  readonly caption?: string;
}
