import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';

const flag = (name: string) => ({ message: `${name} must be true or false` });

/** Switches to change; the others stay as they are. */
export class UpdateNoticeSettingsDto {
  @ApiPropertyOptional({ description: 'QA lead: a lot awaits a decision' })
  @IsOptional()
  @IsBoolean(flag('lotAwaitsDecision'))
  readonly lotAwaitsDecision?: boolean;

  @ApiPropertyOptional({ description: 'QA lead: a lot reaches its reject number' })
  @IsOptional()
  @IsBoolean(flag('lotRejectNumber'))
  readonly lotRejectNumber?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a lot is rejected' })
  @IsOptional()
  @IsBoolean(flag('lotRejected'))
  readonly lotRejected?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a corrective action falls overdue' })
  @IsOptional()
  @IsBoolean(flag('scarOverdue'))
  readonly scarOverdue?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a supplier answers a corrective action' })
  @IsOptional()
  @IsBoolean(flag('scarAnswered'))
  readonly scarAnswered?: boolean;

  @ApiPropertyOptional({ description: 'One daily digest instead of one e-mail each' })
  @IsOptional()
  @IsBoolean(flag('digest'))
  readonly digest?: boolean;
}
