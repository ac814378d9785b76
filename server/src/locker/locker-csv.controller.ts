import {
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Inject,
  Post,
  Query,
  Res,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiProduces, ApiResponse, ApiTags } from '@nestjs/swagger';
import { type LockerImportResult, decodeLockerCsv } from '@gramwatt/shared';
import type { Response } from 'express';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import { CLOCK, type Clock } from '../common/clock';
import type { AccountRow } from '../database/schema';
import {
  CsvFileInterceptor,
  CsvUploadErrorsInterceptor,
  type UploadedCsvFile,
  csvBytes,
  csvFieldName,
} from './csv-upload';
import { LockerCsvService } from './locker-csv.service';
import { LockerImportQueryDto, LockerImportResultDto } from './locker.dto';

const notUtf8Message = 'The file is not UTF-8 text; save it as "CSV UTF-8" and try again';

/** Import a locker from CSV (preview, then add or replace in one transaction) and export it. */
@ApiTags('locker')
@ApiSession()
@Controller('locker')
export class LockerCsvController {
  constructor(
    private readonly csv: LockerCsvService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  /**
   * `commit=false` (default): a preview that writes nothing, always 200 with the report. `commit=true`: writes
   * every row or none; 400 with the same report (and the report's lines as `errors`) when any row is bad.
   */
  @Post('import')
  @HttpCode(HttpStatus.OK)
  @UseInterceptors(CsvUploadErrorsInterceptor, CsvFileInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: [csvFieldName],
      properties: { [csvFieldName]: { type: 'string', format: 'binary' } },
    },
  })
  @ApiResponse({
    status: HttpStatus.OK,
    type: LockerImportResultDto.Output,
    description: 'The report and preview; written when commit=true and ok',
  })
  @ApiErrorResponses(400, 413, 415)
  async import(
    @CurrentAccount() account: AccountRow,
    @Query() query: LockerImportQueryDto,
    @UploadedFile() file: UploadedCsvFile | undefined,
    @Res({ passthrough: true }) response: Response,
  ) {
    const text = decodeLockerCsv(csvBytes(file));
    const result: LockerImportResult =
      text === undefined
        ? {
            ok: false,
            mode: query.mode,
            committed: false,
            rowCount: 0,
            report: [{ row: 1, column: '', message: notUtf8Message }],
            preview: [],
          }
        : await this.csv.import(account.id, text, query.mode, query.commit);
    if (query.commit && !result.ok) {
      response.status(HttpStatus.BAD_REQUEST);
      const errors = result.report.map((issue) => ({
        path: ['rows', String(issue.row), ...(issue.column ? [issue.column] : [])].join('.'),
        message: issue.message,
      }));
      return { statusCode: HttpStatus.BAD_REQUEST, message: importRejectedMessage(result), errors, ...result };
    }
    return result;
  }

  /** The whole locker as a CSV attachment, in the columns the import reads. */
  @Get('export')
  @ApiProduces('text/csv')
  @ApiResponse({ status: HttpStatus.OK, description: 'text/csv attachment', schema: { type: 'string' } })
  async export(@CurrentAccount() account: AccountRow, @Res({ passthrough: true }) response: Response): Promise<string> {
    const text = await this.csv.export(account.id);
    const day = this.clock.now().toISOString().slice(0, 10);
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="gramwatt-locker-${day}.csv"`);
    response.setHeader('Cache-Control', 'no-store');
    return text;
  }
}

function importRejectedMessage(result: LockerImportResult): string {
  const problems = result.report.length;
  return `Nothing was imported: the file has ${problems === 1 ? 'a problem' : `${problems} problems`}`;
}
