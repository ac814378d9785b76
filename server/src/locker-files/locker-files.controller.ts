import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Res,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiProduces, ApiResponse, ApiTags } from '@nestjs/swagger';
import { maxLockerFileBytes } from '@gramwatt/shared';
import type { Response } from 'express';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow } from '../database/schema';
import { contentDisposition } from './file-name';
import {
  ItemFileParamsDto,
  ItemFilesParamsDto,
  LockerFileListResponseDto,
  LockerFileResponseDto,
  LockerFileUploadDto,
} from './locker-files.dto';
import { type FileDownload, LockerFilesService } from './locker-files.service';
import { LockerFileUploadInterceptor, missingFileError } from './upload-interceptor';

/** What multer hands over for the `file` field (memory storage). */
interface UploadedMemoryFile {
  buffer: Buffer;
  originalname: string;
}

/**
 * Photos and spec sheets of the signed-in member's locker items. Every route checks the item is the
 * caller's: another member's item or file answers 404.
 */
@ApiTags('locker')
@ApiSession()
@Controller('locker/items/:itemId/files')
export class LockerFilesController {
  constructor(private readonly files: LockerFilesService) {}

  /** Uploads a photo (JPEG, PNG, WebP) or a spec sheet (PDF), at most 5 MB; the type is read from the bytes. */
  @Post()
  @UseInterceptors(LockerFileUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'purpose'],
      properties: {
        file: { type: 'string', format: 'binary', description: `At most ${maxLockerFileBytes} bytes` },
        purpose: { type: 'string', enum: ['photo', 'spec-sheet'] },
      },
    },
  })
  @ZodResponse({ status: HttpStatus.CREATED, type: LockerFileResponseDto, description: 'The stored file' })
  @ApiErrorResponses(400, 404, 409, 413, 415)
  async upload(
    @CurrentAccount() account: AccountRow,
    @Param() params: ItemFilesParamsDto,
    @UploadedFile() file: UploadedMemoryFile | undefined,
    @Body() body: LockerFileUploadDto,
  ) {
    if (!file) throw missingFileError();
    const stored = await this.files.upload(
      account.id,
      params.itemId,
      { bytes: file.buffer, originalName: file.originalname },
      body.purpose,
    );
    return { file: stored };
  }

  /** The item's files, oldest first. */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: LockerFileListResponseDto })
  @ApiErrorResponses(404)
  async list(@CurrentAccount() account: AccountRow, @Param() params: ItemFilesParamsDto) {
    return { files: await this.files.listForItem(account.id, params.itemId) };
  }

  /** The file's bytes as uploaded: photos inline, spec sheets as an attachment. */
  @Get(':fileId')
  @ApiProduces('image/jpeg', 'image/png', 'image/webp', 'application/pdf')
  @ApiResponse({ status: HttpStatus.OK, description: 'The bytes' })
  @ApiErrorResponses(404)
  async download(
    @CurrentAccount() account: AccountRow,
    @Param() params: ItemFileParamsDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const found = await this.files.download(account.id, params.itemId, params.fileId);
    const disposition = found.file.purpose === 'photo' ? 'inline' : 'attachment';
    return send(response, found, found.file.contentType, disposition, found.file.fileName);
  }

  /** A small WebP of a photo (404 for spec sheets). */
  @Get(':fileId/thumb')
  @ApiProduces('image/webp')
  @ApiResponse({ status: HttpStatus.OK, description: 'The thumbnail' })
  @ApiErrorResponses(404)
  async thumbnail(
    @CurrentAccount() account: AccountRow,
    @Param() params: ItemFileParamsDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<StreamableFile> {
    const found = await this.files.thumbnail(account.id, params.itemId, params.fileId);
    const stem = found.file.fileName.replace(/\.[^.]+$/, '');
    return send(response, found, found.object.contentType, 'inline', `${stem}-thumb.webp`);
  }

  /** Deletes the file and its thumbnail. */
  @Delete(':fileId')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(404)
  async remove(@CurrentAccount() account: AccountRow, @Param() params: ItemFileParamsDto): Promise<void> {
    await this.files.remove(account.id, params.itemId, params.fileId);
  }
}

/**
 * Sends stored bytes with the type found at upload (never sniffed by the browser: `nosniff`), a
 * sandboxing CSP in case a browser renders the file as a page, and a private cache.
 */
function send(
  response: Response,
  found: FileDownload,
  contentType: string,
  disposition: 'inline' | 'attachment',
  fileName: string,
): StreamableFile {
  response.set({
    'X-Content-Type-Options': 'nosniff',
    'Content-Security-Policy': "default-src 'none'; sandbox",
    'Cache-Control': 'private, max-age=300',
  });
  return new StreamableFile(found.object.body, {
    type: contentType,
    length: found.object.body.length,
    disposition: contentDisposition(disposition, fileName),
  });
}
