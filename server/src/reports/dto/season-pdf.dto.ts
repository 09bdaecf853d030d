import { ApiProperty } from '@nestjs/swagger';
import { Matches } from 'class-validator';

export class SeasonPdfDto {
  @ApiProperty({ example: '2026-09-01', description: 'First local date at the club, inclusive.' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'from must be a date such as 2026-09-01.' })
  from: string;

  @ApiProperty({ example: '2027-04-30', description: 'Last local date at the club, inclusive.' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'to must be a date such as 2027-04-30.' })
  to: string;
}

export interface ReportJobDto {
  id: string;
  state: 'queued' | 'working' | 'done' | 'failed';
  error?: string;
  from: string;
  to: string;
  createdAt: string;
  finishedAt: string | null;
}
