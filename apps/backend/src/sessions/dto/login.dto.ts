import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'clerk@demo.example' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(TEXT_MAX.email)
  readonly email: string;

  @ApiProperty({ example: 'gaugeproof-demo' })
  @IsString()
  @MinLength(1, { message: 'password is required' })
  @MaxLength(200)
  readonly password: string;
}
