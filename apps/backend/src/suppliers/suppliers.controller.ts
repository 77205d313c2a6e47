import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateSupplierDto } from './dto/create-supplier.dto';
import { ListSuppliersDto } from './dto/list-suppliers.dto';
import { UpdateSupplierDto } from './dto/update-supplier.dto';
import { SuppliersService } from './suppliers.service';
import { IdPipe } from '../common/id.pipe';

@ApiTags('suppliers')
@Controller('suppliers')
export class SuppliersController {
  constructor(private readonly suppliers: SuppliersService) {}

  @Get()
  @Roles(...ALL_ROLES)
  list(@Query() query: ListSuppliersDto) {
    return this.suppliers.list(query);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  get(@Param('id', IdPipe) id: number) {
    return this.suppliers.get(id);
  }

  @Post()
  @Roles('purchasing', 'admin')
  create(@Body() dto: CreateSupplierDto, @CurrentUser() actor: RequestUser) {
    return this.suppliers.create(dto, actor);
  }

  @Patch(':id')
  @Roles('purchasing', 'admin')
  update(
    @Param('id', IdPipe) id: number,
    @Body() dto: UpdateSupplierDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.suppliers.update(id, dto, actor);
  }
}
