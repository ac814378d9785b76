import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow } from '../database/schema';
import { LockerItemResponseDto } from '../locker/locker.dto';
import { toLockerItem } from '../locker/locker-item-view';
import {
  CatalogueEntryInputDto,
  CatalogueEntryResponseDto,
  CatalogueIdParamsDto,
  CatalogueListQueryDto,
  CatalogueListResponseDto,
} from './catalogue.dto';
import { CatalogueService } from './catalogue.service';
import { toCatalogueEntry } from './catalogue-view';

/**
 * The reference catalogue of generic example items. Every signed-in account reads it and copies entries
 * into its own locker; only admins create, change and delete entries (403 for members).
 */
@ApiTags('catalogue')
@ApiSession()
@Controller('catalogue')
export class CatalogueController {
  constructor(private readonly catalogue: CatalogueService) {}

  /** Every entry (or one kind's), in power-role order then by name. */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: CatalogueListResponseDto })
  @ApiErrorResponses(400)
  async list(@Query() query: CatalogueListQueryDto) {
    const rows = await this.catalogue.list(query.kind);
    return { entries: rows.map(toCatalogueEntry) };
  }

  @Get(':id')
  @ZodResponse({ status: HttpStatus.OK, type: CatalogueEntryResponseDto })
  @ApiErrorResponses(400, 404)
  async get(@Param() params: CatalogueIdParamsDto) {
    return { entry: toCatalogueEntry(await this.catalogue.get(params.id)) };
  }

  /** Adds an entry (admins). */
  @Post()
  @Roles('admin')
  @ZodResponse({ status: HttpStatus.CREATED, type: CatalogueEntryResponseDto })
  @ApiErrorResponses(400, 403, 409)
  async create(@CurrentAccount() account: AccountRow, @Body() body: CatalogueEntryInputDto) {
    return { entry: toCatalogueEntry(await this.catalogue.create(body, account.id)) };
  }

  /** Replaces an entry's name, notes and spec (admins). Items copied from it earlier do not change. */
  @Put(':id')
  @Roles('admin')
  @ZodResponse({ status: HttpStatus.OK, type: CatalogueEntryResponseDto })
  @ApiErrorResponses(400, 403, 404, 409)
  async update(@Param() params: CatalogueIdParamsDto, @Body() body: CatalogueEntryInputDto) {
    return { entry: toCatalogueEntry(await this.catalogue.update(params.id, body)) };
  }

  /** Deletes an entry (admins). Items copied from it stay in their lockers. */
  @Delete(':id')
  @Roles('admin')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(400, 403, 404)
  async remove(@Param() params: CatalogueIdParamsDto): Promise<void> {
    await this.catalogue.remove(params.id);
  }

  /** Copies the entry into the caller's own locker as a new item with count owned 1. */
  @Post(':id/copy')
  @ZodResponse({ status: HttpStatus.CREATED, type: LockerItemResponseDto, description: 'The new locker item' })
  @ApiErrorResponses(400, 404, 409)
  async copy(@CurrentAccount() account: AccountRow, @Param() params: CatalogueIdParamsDto) {
    return { item: toLockerItem(await this.catalogue.copyToLocker(params.id, account.id)) };
  }
}
