import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseEnumPipe,
  Patch,
  Post,
  Query,
  Res,
  StreamableFile,
  UploadedFiles,
} from '@nestjs/common';
import {
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiParam,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import type { Photo, PhotoListResponse, PhotoSubjectType, PhotoUploadResponse } from '@peakwise/shared';
import type { FastifyReply } from 'fastify';
import type { AccountRecord } from '../account/account.repository.js';
import { CurrentAccount } from '../common/auth.decorators.js';
import { IdParam } from '../common/id-param.js';
import { Idempotent } from '../common/idempotency/idempotency.interceptor.js';
import { fieldError } from '../common/validation.js';
import { ListPhotosQuery, UpdatePhotoDto } from './dto/photo.dto.js';
import { PhotoListView, PhotoUploadView, PhotoView } from './dto/photo.view.js';
import { PhotoService, type PhotoVariant, type UploadedPhoto } from './photo.service.js';
import { PhotoUpload } from './photo.upload.js';

const READABLE = 'of yours, or of a current student of yours,';
// Images never change under a key; the access check may, so browsers keep them for an hour only.
const IMAGE_CACHE = 'private, max-age=3600';

/** Jar and crumb photos: uploads, lists and the images themselves (shared/src/contracts/photo.ts). */
@ApiTags('photos')
@Controller()
export class PhotoController {
  constructor(private readonly service: PhotoService) {}

  @Post('feedings/:feedingId/photos')
  @Idempotent()
  @PhotoUpload()
  @ApiCreatedResponse({ type: PhotoUploadView })
  @ApiNotFoundResponse({ description: 'No feeding of yours with this id' })
  uploadToFeeding(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') id: string,
    @UploadedFiles() files: UploadedPhoto[] | undefined,
  ): Promise<PhotoUploadResponse> {
    return this.upload(account, 'feeding', id, files);
  }

  @Post('rise-checks/:riseCheckId/photos')
  @Idempotent()
  @PhotoUpload()
  @ApiCreatedResponse({ type: PhotoUploadView })
  @ApiNotFoundResponse({ description: 'No rise check of yours with this id' })
  uploadToRiseCheck(
    @CurrentAccount() account: AccountRecord,
    @IdParam('riseCheckId') id: string,
    @UploadedFiles() files: UploadedPhoto[] | undefined,
  ): Promise<PhotoUploadResponse> {
    return this.upload(account, 'rise-check', id, files);
  }

  @Post('plans/:planId/photos')
  @Idempotent()
  @PhotoUpload()
  @ApiCreatedResponse({ type: PhotoUploadView })
  @ApiNotFoundResponse({ description: 'No bake plan of yours with this id' })
  uploadToPlan(
    @CurrentAccount() account: AccountRecord,
    @IdParam('planId') id: string,
    @UploadedFiles() files: UploadedPhoto[] | undefined,
  ): Promise<PhotoUploadResponse> {
    return this.upload(account, 'bake-plan', id, files);
  }

  @Get('feedings/:feedingId/photos')
  @ApiOkResponse({ type: PhotoListView })
  @ApiNotFoundResponse({ description: `No feeding ${READABLE} with this id` })
  listOfFeeding(
    @CurrentAccount() account: AccountRecord,
    @IdParam('feedingId') id: string,
    @Query() query: ListPhotosQuery,
  ): Promise<PhotoListResponse> {
    return this.service.list(account, 'feeding', id, query);
  }

  @Get('plans/:planId/photos')
  @ApiOkResponse({ type: PhotoListView })
  @ApiNotFoundResponse({ description: `No bake plan ${READABLE} with this id` })
  listOfPlan(
    @CurrentAccount() account: AccountRecord,
    @IdParam('planId') id: string,
    @Query() query: ListPhotosQuery,
  ): Promise<PhotoListResponse> {
    return this.service.list(account, 'bake-plan', id, query);
  }

  @Get('cultures/:cultureId/photos')
  @ApiOkResponse({ type: PhotoListView, description: "Its feedings' and rise checks' photos, oldest first" })
  @ApiNotFoundResponse({ description: `No culture ${READABLE} with this id` })
  listOfCulture(
    @CurrentAccount() account: AccountRecord,
    @IdParam('cultureId') id: string,
    @Query() query: ListPhotosQuery,
  ): Promise<PhotoListResponse> {
    return this.service.list(account, 'culture', id, query);
  }

  @Get('photos/:photoId/:variant')
  @ApiParam({ name: 'variant', enum: ['display', 'thumbnail'] })
  @ApiProduces('image/webp')
  @ApiOkResponse({ description: 'The image (WebP), private to whoever may read its log' })
  @ApiNotFoundResponse({ description: `No photo ${READABLE} with this id` })
  async image(
    @CurrentAccount() account: AccountRecord,
    @IdParam('photoId') id: string,
    @Param('variant', new ParseEnumPipe(['display', 'thumbnail'], { exceptionFactory: badVariant }))
    variant: PhotoVariant,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<StreamableFile> {
    const object = await this.service.image(account, id, variant);
    void reply.header('cache-control', IMAGE_CACHE).header('x-content-type-options', 'nosniff');
    return new StreamableFile(object.body, { type: 'image/webp', length: object.length });
  }

  @Patch('photos/:photoId')
  @Idempotent()
  @ApiOkResponse({ type: PhotoView })
  @ApiNotFoundResponse({ description: 'No photo of yours with this id' })
  update(
    @CurrentAccount() account: AccountRecord,
    @IdParam('photoId') id: string,
    @Body() body: UpdatePhotoDto,
  ): Promise<Photo> {
    return this.service.updateCaption(account, id, body.caption);
  }

  @Delete('photos/:photoId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted, with its images in storage' })
  @ApiNotFoundResponse({ description: 'No photo of yours with this id' })
  delete(@CurrentAccount() account: AccountRecord, @IdParam('photoId') id: string): Promise<void> {
    return this.service.delete(account, id);
  }

  private upload(
    account: AccountRecord,
    type: PhotoSubjectType,
    id: string,
    files: UploadedPhoto[] | undefined,
  ): Promise<PhotoUploadResponse> {
    return this.service.upload(account, type, id, files ?? []);
  }
}

function badVariant() {
  return fieldError('variant', 'Ask for display or thumbnail.');
}
