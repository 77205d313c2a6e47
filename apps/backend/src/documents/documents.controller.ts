import { Answers } from '../common/answers';
import { Controller, Get, Header, Param, StreamableFile } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators';
import { ALL_ROLES } from '../auth/roles';
import { DocumentsService } from './documents.service';
import { IdPipe } from '../common/id.pipe';

@ApiTags('documents')
@Controller()
export class DocumentsController {
  constructor(private readonly documents: DocumentsService) {}

  /** The hold / reject / accept tag to print and fix to the lot. */
  @Get('lots/:id/tag.pdf')
  @Answers.file('application/pdf')
  @Roles(...ALL_ROLES)
  @ApiProduces('application/pdf')
  @Header('Cache-Control', 'no-store')
  async tag(@Param('id', IdPipe) id: number) {
    const pdf = await this.documents.lotTag(id);
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `inline; filename="lot-${id}-tag.pdf"`,
    });
  }
}
