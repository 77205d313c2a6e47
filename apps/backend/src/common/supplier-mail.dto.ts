import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, MaxLength } from 'class-validator';
import { OptionalText } from './dto-fields';

/** An e-mail to the supplier (a return notice, a SCAR's link): where to, and a note. */
export class SupplierMailDto {
  @ApiPropertyOptional({ description: "Defaults to the supplier's contact e-mail" })
  @IsOptional()
  @IsEmail({}, { message: 'to must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly to?: string;

  @OptionalText(TEXT_MAX.long, { description: 'A note above the standard text' })
  readonly message?: string;
}
