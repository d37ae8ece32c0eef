import { Body, Controller, Get, Header, Post, Res, UploadedFile as UploadedFileParam, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes, ApiPropertyOptional, ApiTags } from '@nestjs/swagger';
import { IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import type { Response } from 'express';
import type { PhotoDto } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { UuidParam } from '../common/uuid-param.js';
import type { SessionUser } from '../common/session-user.js';
import { PHOTO_MAX_BYTES } from './image-processing.js';
import { PhotosService, type UploadedFile } from './photos.service.js';

export class UploadPhotoDto {
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'checkId must be a check id from the catalog' }) checkId?: string;
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'caption must be text' }) @MaxLength(300, { message: 'caption must be at most 300 characters' }) caption?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'photoRequestId must be the id of a photo request on this case' }) photoRequestId?: string;
}

@ApiTags('photos')
@Controller()
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Post('cases/:id/photos')
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 10 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: { file: { type: 'string', format: 'binary' }, checkId: { type: 'string' }, caption: { type: 'string' }, photoRequestId: { type: 'string' } },
    },
  })
  upload(
    @CurrentUser() user: SessionUser,
    @UuidParam('id', 'case') id: string,
    @UploadedFileParam() file: UploadedFile | undefined,
    @Body() dto: UploadPhotoDto,
  ): Promise<PhotoDto> {
    return this.photos.upload(user, id, file, dto);
  }

  @Get('cases/:id/photos')
  async list(@CurrentUser() user: SessionUser, @UuidParam('id', 'case') id: string): Promise<{ photos: PhotoDto[] }> {
    return { photos: await this.photos.list(user, id) };
  }

  @Get('photos/:photoId')
  @Header('Cache-Control', 'private, max-age=3600')
  @Header('X-Content-Type-Options', 'nosniff')
  async get(@CurrentUser() user: SessionUser, @UuidParam('photoId', 'photo') photoId: string, @Res() res: Response): Promise<void> {
    const { body, contentType } = await this.photos.download(user, photoId, false);
    res.type(contentType).send(body);
  }

  @Get('photos/:photoId/thumb')
  @Header('Cache-Control', 'private, max-age=3600')
  @Header('X-Content-Type-Options', 'nosniff')
  async thumb(@CurrentUser() user: SessionUser, @UuidParam('photoId', 'photo') photoId: string, @Res() res: Response): Promise<void> {
    const { body, contentType } = await this.photos.download(user, photoId, true);
    res.type(contentType).send(body);
  }
}
