import { ApiPropertyOptional, IntersectionType, PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { EditVersionDto } from '../../common/versioned-edit';
import { CreateInstrumentDto } from './create-instrument.dto';

/** Changed fields of an instrument, made on the version the client loaded (a stale one: 409). */
export class UpdateInstrumentDto extends IntersectionType(
  PartialType(CreateInstrumentDto),
  EditVersionDto,
) {
  @ApiPropertyOptional({
    description: 'false retires the instrument; readings with it are refused',
  })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  readonly active?: boolean;
}
