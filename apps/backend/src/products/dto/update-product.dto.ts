import { TEXT_MAX } from '@gaugeproof/api-types';
import { ApiPropertyOptional } from '@nestjs/swagger';

import { IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ConductorDto, ConductorList } from './conductor.dto';
import { ProductPolicyDto } from './product-policy.dto';
import { EditVersion, OptionalFlag } from '../../common/dto-fields';

/**
 * Supplier, SKU and kind stay as created (lots are filed under them). `conductors`, when
 * given, replaces the list; specs that go are kept inactive since lots and samples point at them.
 */
export class UpdateProductDto extends ProductPolicyDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'description cannot be empty' })
  @MinLength(1, { message: 'description cannot be empty' })
  @MaxLength(TEXT_MAX.description, {
    message: `description must be at most ${TEXT_MAX.description} characters`,
  })
  readonly description?: string;

  @ApiPropertyOptional({ type: [ConductorDto] })
  @IsOptional()
  @ConductorList()
  readonly conductors?: ConductorDto[];

  @OptionalFlag()
  readonly active?: boolean;

  @EditVersion('The version of the product the edit was made on; a stale one gets 409')
  readonly version!: number;
}
