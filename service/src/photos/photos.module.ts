import { Module } from '@nestjs/common';
import { CasesModule } from '../cases/cases.module.js';
import { PhotosController } from './photos.controller.js';
import { PhotoStorage, S3PhotoStorage } from './photo-storage.js';
import { PhotosService } from './photos.service.js';

@Module({
  imports: [CasesModule],
  controllers: [PhotosController],
  providers: [PhotosService, S3PhotoStorage, { provide: PhotoStorage, useExisting: S3PhotoStorage }],
})
export class PhotosModule {}
