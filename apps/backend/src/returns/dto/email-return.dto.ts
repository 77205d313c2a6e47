import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, IsString, MaxLength } from 'class-validator';

export class EmailReturnDto {
  @ApiPropertyOptional({ description: "Defaults to the supplier's contact e-mail" })
  @IsOptional()
  @IsEmail({}, { message: 'to must be an e-mail address' })
  @MaxLength(254)
  readonly to?: string;

  @ApiPropertyOptional({ description: 'A note above the standard text' })
  @IsOptional()
  @IsString()
  @MaxLength(4000, { message: 'message must be at most 4000 characters' })
  readonly message?: string;
}
