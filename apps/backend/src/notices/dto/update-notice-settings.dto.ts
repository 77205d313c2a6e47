import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, ValidateIf } from 'class-validator';

/** Absent leaves a switch as it is; an explicit null is refused like any non-boolean. */
const present = (_: object, value: unknown) => value !== undefined;
const flag = (name: string) => ({ message: `${name} must be true or false` });

/** Switches to change; the others stay as they are. */
export class UpdateNoticeSettingsDto {
  @ApiPropertyOptional({ description: 'QA lead: a lot awaits a decision' })
  @ValidateIf(present)
  @IsBoolean(flag('lotAwaitsDecision'))
  readonly lotAwaitsDecision?: boolean;

  @ApiPropertyOptional({ description: 'QA lead: a lot reaches its reject number' })
  @ValidateIf(present)
  @IsBoolean(flag('lotRejectNumber'))
  readonly lotRejectNumber?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a lot is rejected' })
  @ValidateIf(present)
  @IsBoolean(flag('lotRejected'))
  readonly lotRejected?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a corrective action falls overdue' })
  @ValidateIf(present)
  @IsBoolean(flag('scarOverdue'))
  readonly scarOverdue?: boolean;

  @ApiPropertyOptional({ description: 'Purchasing: a supplier answers a corrective action' })
  @ValidateIf(present)
  @IsBoolean(flag('scarAnswered'))
  readonly scarAnswered?: boolean;

  @ApiPropertyOptional({
    description: 'QA lead, admin: a concession waits for a second approval (never its requester)',
  })
  @ValidateIf(present)
  @IsBoolean(flag('concessionAwaitsApproval'))
  readonly concessionAwaitsApproval?: boolean;

  @ApiPropertyOptional({ description: 'One daily digest instead of one e-mail each' })
  @ValidateIf(present)
  @IsBoolean(flag('digest'))
  readonly digest?: boolean;
}
