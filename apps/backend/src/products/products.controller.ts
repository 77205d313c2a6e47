import { Answers } from '../common/answers';
import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { CreateProductDto } from './dto/create-product.dto';
import { ListProductsDto } from './dto/list-products.dto';
import { SamplingPlanQueryDto } from './dto/sampling-plan-query.dto';
import { UpdateProductDto } from './dto/update-product.dto';
import { ProductsService } from './products.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('products')
@Controller('products')
export class ProductsController {
  constructor(private readonly products: ProductsService) {}

  @Get()
  @Answers('ProductPage')
  @Roles(...ALL_ROLES)
  list(@Query() query: ListProductsDto) {
    return this.products.list(query);
  }

  @Get(':id')
  @Answers('Product')
  @Roles(...ALL_ROLES)
  get(@IdParam() id: number) {
    return this.products.get(id);
  }

  /** The plan a lot of `quantity` units would get now (the receiving form shows it). */
  @Get(':id/sampling-plan')
  @Answers('SamplingPlanAnswer')
  @Roles(...ALL_ROLES)
  samplingPlan(@IdParam() id: number, @Query() query: SamplingPlanQueryDto) {
    return this.products.samplingPlan(id, query.quantity);
  }

  @Post()
  @Answers('Product')
  @Roles('qa_lead', 'purchasing', 'admin')
  create(@Body() dto: CreateProductDto, @CurrentUser() actor: RequestUser) {
    return this.products.create(dto, actor);
  }

  @Patch(':id')
  @Answers('Product')
  @Roles('qa_lead', 'purchasing', 'admin')
  update(@IdParam() id: number, @Body() dto: UpdateProductDto, @CurrentUser() actor: RequestUser) {
    return this.products.update(id, dto, actor);
  }
}
