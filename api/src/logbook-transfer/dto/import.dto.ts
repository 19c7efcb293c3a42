import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsObject, IsOptional, IsString } from 'class-validator';
import { CSV_COLUMNS } from '@peakwise/shared';

export class ImportFeedingsDto {
  @ApiProperty({ description: 'The CSV file as text, with a header row' })
  @IsString({ message: 'Send the CSV file as text.' })
  csv: string;

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { type: 'string' },
    description: `Our column → the header in this file, for columns named differently. Our columns: ${CSV_COLUMNS.join(', ')}`,
  })
  @IsOptional()
  @IsObject({ message: 'Send the mapping as an object of our column → your header.' })
  mapping?: Record<string, string>;

  @ApiPropertyOptional({ description: 'true: check and count only, write nothing' })
  @IsOptional()
  @IsBoolean({ message: 'Send true or false.' })
  dryRun?: boolean;
}

class ImportCountsView {
  @ApiProperty() new: number;
  @ApiProperty() duplicate: number;
}

class ImportErrorView {
  @ApiProperty({ description: 'Line in the file, 1-based, the header being line 1' }) line: number;
  @ApiProperty({ description: 'Our column name' }) field: string;
  @ApiProperty() message: string;
}

export class ImportResultView {
  @ApiProperty() dryRun: boolean;
  @ApiProperty({ type: ImportCountsView }) feedings: ImportCountsView;
  @ApiProperty({ type: ImportCountsView }) riseChecks: ImportCountsView;
  @ApiProperty({ type: [ImportErrorView] }) errors: ImportErrorView[];
  @ApiProperty({
    type: 'array',
    items: { type: 'object', additionalProperties: { type: 'string' } },
    description: 'The first 10 rows, by our column names',
  })
  preview: Record<string, string>[];
}
