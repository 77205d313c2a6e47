import { Module } from '@nestjs/common';
import { DocumentsController } from './documents.controller';
import { DocumentsService } from './documents.service';

/** Printed documents: lot tags (the return's evidence pack is built by returns with these parts). */
@Module({ controllers: [DocumentsController], providers: [DocumentsService] })
export class DocumentsModule {}
