import { IntersectionType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../common/versioned-edit';
import { CreateSupplierDto } from './create-supplier.dto';

/** Changed fields of a supplier, made on the version the client loaded (a stale one: 409). */
export class UpdateSupplierDto extends IntersectionType(
  PartialType(CreateSupplierDto),
  EditVersionDto,
) {}
