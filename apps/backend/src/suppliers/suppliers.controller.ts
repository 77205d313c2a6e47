import { Answers } from '../common/answers';
import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateSupplierDto } from './dto/create-supplier.dto';
import { ListSuppliersDto } from './dto/list-suppliers.dto';
import { UpdateSupplierDto } from './dto/update-supplier.dto';
import { SuppliersService } from './suppliers.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('suppliers')
@Controller('suppliers')
export class SuppliersController {
  constructor(private readonly suppliers: SuppliersService) {}

  @Get()
  @Answers('SupplierPage')
  @Roles(...ALL_ROLES)
  list(@Query() query: ListSuppliersDto) {
    return this.suppliers.list(query);
  }

  @Get(':id')
  @Answers('Supplier')
  @Roles(...ALL_ROLES)
  get(@IdParam() id: number) {
    return this.suppliers.get(id);
  }

  @Post()
  @Answers('Supplier')
  @Roles('purchasing', 'admin')
  create(@Body() dto: CreateSupplierDto, @CurrentUser() actor: RequestUser) {
    return this.suppliers.create(dto, actor);
  }

  @Patch(':id')
  @Answers('Supplier')
  @Roles('purchasing', 'admin')
  update(@IdParam() id: number, @Body() dto: UpdateSupplierDto, @CurrentUser() actor: RequestUser) {
    return this.suppliers.update(id, dto, actor);
  }
}
