import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, MaxLength, Min } from 'class-validator';
import { ListQueryDto } from '../../common/paging';
import { MESSAGE_STATUSES, type MessageStatus } from '../entities/outbound-message.entity';

export class ListMessagesDto extends ListQueryDto {
  @ApiPropertyOptional({ enum: MESSAGE_STATUSES })
  @IsOptional()
  @IsIn(MESSAGE_STATUSES, { message: `status must be one of ${MESSAGE_STATUSES.join(', ')}` })
  readonly status?: MessageStatus;

  @ApiPropertyOptional({ example: 'vendor_return' })
  @IsOptional()
  @IsString()
  @MaxLength(48)
  readonly relatedType?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'relatedId must be a whole number' })
  @Min(1, { message: 'relatedId must be a whole number' })
  readonly relatedId?: number;
}
