import { Answers, PostAction } from '../common/answers';
import { Body, Controller, Get, Post, Res, StreamableFile, UploadedFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, Roles } from '../auth/decorators';
import type { RequestUser } from '../auth/request-user';
import { ALL_ROLES } from '../auth/roles';
import { UploadPhotoDto } from './dto/upload-photo.dto';
import { VoidPhotoDto } from './dto/void-photo.dto';
import { FileUpload } from '../storage/single-file.interceptor';
import { PhotoUploadInterceptor } from './photo-upload.interceptor';
import { PhotosService } from './photos.service';
import { IdParam } from '../common/id.pipe';

@ApiTags('photos')
@Controller()
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Post('lots/:id/photos')
  @Answers('Photo')
  @Roles('clerk', 'qa_lead', 'admin')
  @FileUpload(PhotoUploadInterceptor, 'JPEG, PNG or WebP, at most 15 MB', {
    sampleId: { type: 'integer' },
    caption: { type: 'string', maxLength: 300 },
  })
  upload(
    @IdParam() lotId: number,
    @UploadedFile() file: Express.Multer.File | undefined,
    @Body() dto: UploadPhotoDto,
    @CurrentUser() actor: RequestUser,
  ) {
    return this.photos.upload(lotId, file, dto, actor);
  }

  @PostAction('photos/:id/void', 'Photo')
  @Roles('clerk', 'qa_lead', 'admin')
  // A clerk only their own photo, before the lot is decided (PhotosService.void).
  voidPhoto(@IdParam() id: number, @Body() dto: VoidPhotoDto, @CurrentUser() actor: RequestUser) {
    return this.photos.void(id, dto.reason, actor);
  }

  @Get('photos/:id/original')
  @Answers.file('image/jpeg')
  @Roles(...ALL_ROLES)
  original(@IdParam() id: number, @Res({ passthrough: true }) res: Response) {
    return this.serve(id, 'original', res);
  }

  @Get('photos/:id/thumbnail')
  @Answers.file('image/jpeg')
  @Roles(...ALL_ROLES)
  thumbnail(@IdParam() id: number, @Res({ passthrough: true }) res: Response) {
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
