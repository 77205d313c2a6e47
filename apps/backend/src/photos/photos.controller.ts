import { Answers } from '../common/answers';
import {
  Body,
  Controller,
  HttpCode,
  Get,
  Param,
  Post,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { UploadPhotoDto } from './dto/upload-photo.dto';
import { VoidPhotoDto } from './dto/void-photo.dto';
import { PhotoUploadInterceptor } from './photo-upload.interceptor';
import { PhotosService } from './photos.service';
import { IdPipe } from '../common/id.pipe';

@ApiTags('photos')
@Controller()
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Post('lots/:id/photos')
  @Answers('Photo')
  @Roles('clerk', 'qa_lead', 'admin')
  @UseInterceptors(PhotoUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'JPEG, PNG or WebP, at most 15 MB' },
        sampleId: { type: 'integer' },
        caption: { type: 'string', maxLength: 300 },
      },
    },
  })
  upload(
    @Param('id', IdPipe) lotId: number,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() dto: UploadPhotoDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.photos.upload(lotId, file, dto, actor);
  }

  @Post('photos/:id/void')
  @HttpCode(200)
  @Answers('Photo')
  @Roles('clerk', 'qa_lead', 'admin')
  // A clerk only their own photo, before the lot is decided (PhotosService.void).
  voidPhoto(
    @Param('id', IdPipe) id: number,
    @Body() dto: VoidPhotoDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.photos.void(id, dto.reason, actor);
  }

  @Get('photos/:id/original')
  @Answers.file('image/jpeg')
  @Roles(...ALL_ROLES)
  original(@Param('id', IdPipe) id: number, @Res({ passthrough: true }) res: Response) {
    return this.serve(id, 'original', res);
  }

  @Get('photos/:id/thumbnail')
  @Answers.file('image/jpeg')
  @Roles(...ALL_ROLES)
  thumbnail(@Param('id', IdPipe) id: number, @Res({ passthrough: true }) res: Response) {
    return this.serve(id, 'thumbnail', res);
  }

  private async serve(id: number, which: 'original' | 'thumbnail', res: Response) {
    const file = await this.photos.open(id, which);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Cache-Control', 'private, max-age=3600');
    return new StreamableFile(file.stream, {
      type: file.mimeType,
      disposition: `inline; filename="${file.name}"`,
    });
  }
}
