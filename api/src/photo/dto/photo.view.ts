import { ApiProperty } from '@nestjs/swagger';
import type { Photo, PhotoListResponse, PhotoSubjectType, PhotoUploadResponse } from '@peakwise/shared';

// Documents the photo shapes (shared/src/contracts/photo.ts) in the OpenAPI reference.

export class PhotoView implements Photo {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: ['feeding', 'rise-check', 'bake-plan'] }) subjectType: PhotoSubjectType;
  @ApiProperty({ format: 'uuid' }) subjectId: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) cultureId: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'Directly or through its rise check' })
  feedingId: string | null;
  @ApiProperty({ type: String, nullable: true }) caption: string | null;
  @ApiProperty({ description: 'Of the display image, px' }) width: number;
  @ApiProperty({ description: 'Of the display image, px' }) height: number;
  @ApiProperty({ example: '/api/photos/…/display' }) displayUrl: string;
  @ApiProperty({ example: '/api/photos/…/thumbnail' }) thumbnailUrl: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'From the camera (EXIF), if it says' })
  takenAt: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class PhotoUploadView implements PhotoUploadResponse {
  @ApiProperty({ type: [PhotoView], description: 'In the order the files were sent' }) items: PhotoView[];
}

export class PhotoListView implements PhotoListResponse {
  @ApiProperty({ type: [PhotoView], description: 'Oldest first' }) items: PhotoView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}

/** The multipart form of an upload, for the OpenAPI reference. */
export class PhotoUploadForm {
  @ApiProperty({ type: 'array', items: { type: 'string', format: 'binary' }, description: 'JPEG, PNG or WebP' })
  photos: unknown[];
}
