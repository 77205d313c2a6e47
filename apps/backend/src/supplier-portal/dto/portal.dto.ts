import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';

const answer = (field: string) => ({
  min: { message: `${field} must be at least ${TEXT_MIN.answer} characters` },
  max: { message: `${field} must be at most ${TEXT_MAX.long} characters` },
});

/** The supplier's answer, through its link. */
export class SupplierResponseDto {
  @ApiProperty({ description: 'What was done with suspect stock, here and in transit' })
  @IsString({ message: 'containment must be text' })
  @MinLength(TEXT_MIN.answer, answer('containment').min)
  @MaxLength(TEXT_MAX.long, answer('containment').max)
  readonly containment: string;

  @ApiProperty()
  @IsString({ message: 'rootCause must be text' })
  @MinLength(TEXT_MIN.answer, answer('rootCause').min)
  @MaxLength(TEXT_MAX.long, answer('rootCause').max)
  readonly rootCause: string;

  @ApiProperty()
  @IsString({ message: 'correctiveAction must be text' })
  @MinLength(TEXT_MIN.answer, answer('correctiveAction').min)
  @MaxLength(TEXT_MAX.long, answer('correctiveAction').max)
  readonly correctiveAction: string;

  @ApiProperty({ example: '2026-12-31', description: 'When the fix is in place' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'promisedOn must be a date YYYY-MM-DD' })
  readonly promisedOn: string;
}

/** E-mails the supplier a link to answer the request. */
export class SendCorrectiveActionDto {
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
