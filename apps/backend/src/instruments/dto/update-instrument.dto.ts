import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateInstrumentDto } from './create-instrument.dto';

export class UpdateInstrumentDto extends PartialType(CreateInstrumentDto) {
  @ApiPropertyOptional({
    description: 'false retires the instrument; readings with it are refused',
  })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  readonly active?: boolean;
}
