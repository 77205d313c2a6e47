import { Answers } from '../common/answers';
import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  Post,
  Query,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiProduces, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/decorators';
import { FileUpload, singleFileInterceptor } from '../storage/single-file.interceptor';
import { IdPipe } from '../common/id.pipe';
import { SupplierResponseDto } from './dto/portal.dto';
import { PortalThrottle } from './portal-throttle';
import { MAX_ATTACHMENT_BYTES, SupplierPortalService } from './supplier-portal.service';

const AttachmentUpload = singleFileInterceptor(
  MAX_ATTACHMENT_BYTES,
  'The file is larger than 10 MB: send a smaller PDF or photo.',
);

/**
 * The supplier's page: public because the supplier has no account; every route checks the
 * token (signature, then the stored hash, expiry and revocation) and shows one request.
 */
@ApiTags('supplier-portal')
@Controller('supplier-portal/:token')
@UseInterceptors(PortalThrottle)
export class SupplierPortalController {
  constructor(private readonly portal: SupplierPortalService) {}

  @Get()
  @Answers('PortalView')
  @Public()
  view(@Param('token') token: string, @Res({ passthrough: true }) res: Response) {
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('Referrer-Policy', 'no-referrer');
    return this.portal.view(token);
  }

  @Post('response')
  @Answers('PortalScarView')
  @Public()
  @HttpCode(200)
  respond(@Param('token') token: string, @Body() dto: SupplierResponseDto) {
    return this.portal.respond(token, dto);
  }

  @Post('attachments')
  @Answers('PortalAttachment')
  @Public()
  @FileUpload(AttachmentUpload, 'PDF, JPEG, PNG or WebP, ≤ 10 MB')
  attach(@Param('token') token: string, @UploadedFile() file: Express.Multer.File | undefined) {
    return this.portal.attach(token, file);
  }

  @Get('evidence.pdf')
  @Answers.file('application/pdf')
  @Public()
  @ApiProduces('application/pdf')
  async evidence(@Param('token') token: string, @Res({ passthrough: true }) res: Response) {
    const { pdf, number } = await this.portal.evidencePdf(token);
    res.setHeader('Cache-Control', 'no-store');
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `inline; filename="${number}-evidence.pdf"`,
    });
  }

  /** A photo of a return notice's lots, by its place on the page (1, 2, …). */
  @Get('photos/:n')
  @Answers.file('image/jpeg')
  @Public()
  @ApiQuery({ name: 'size', required: false, enum: ['original', 'thumbnail'] })
  @ApiProduces('image/jpeg', 'image/png', 'image/webp')
  async photo(
    @Param('token') token: string,
    @Param('n', IdPipe) n: number,
    @Query('size') size: string | undefined,
    @Res({ passthrough: true }) res: Response,
  ) {
    const file = await this.portal.photo(token, n, size === 'thumbnail' ? 'thumbnail' : 'original');
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    return new StreamableFile(file.stream, {
      type: file.type,
      disposition: `inline; filename="${file.name}"`,
    });
  }
}
