import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, IsString, MaxLength } from 'class-validator';

export class EmailReturnDto {
  @ApiPropertyOptional({ description: "Defaults to the supplier's contact e-mail" })
  @IsOptional()
  @IsEmail({}, { message: 'to must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly to?: string;

  @ApiPropertyOptional({ description: 'A note above the standard text' })
  @IsOptional()
  @IsString()
  @MaxLength(TEXT_MAX.long, { message: `message must be at most ${TEXT_MAX.long} characters` })
  readonly message?: string;
}
