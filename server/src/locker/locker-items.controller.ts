import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post, Put, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { CurrentAccount } from '../auth/decorators/current-account.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AccountRow } from '../database/schema';
import {
  LockerItemIdParamsDto,
  LockerItemInputDto,
  LockerItemListResponseDto,
  LockerItemResponseDto,
  LockerListQueryDto,
} from './locker.dto';
import { LockerService } from './locker.service';
import { toLockerItem, totalPowerGearMassG } from './locker-item-view';

/** The signed-in member's own locker items. Another member's item answers 404. */
@ApiTags('locker')
@ApiSession()
@Controller('locker/items')
export class LockerItemsController {
  constructor(private readonly locker: LockerService) {}

  /** The member's items, filtered and sorted; `totalMassG` sums the power gear of the items listed. */
  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: LockerItemListResponseDto })
  @ApiErrorResponses(400)
  async list(@CurrentAccount() account: AccountRow, @Query() query: LockerListQueryDto) {
    const rows = await this.locker.list(account.id, query);
    const files = await this.locker.filesByItem(
      account.id,
      rows.map((r) => r.id),
    );
    return { items: rows.map((row) => toLockerItem(row, files.get(row.id))), totalMassG: totalPowerGearMassG(rows) };
  }

  @Get(':id')
  @ZodResponse({ status: HttpStatus.OK, type: LockerItemResponseDto })
  @ApiErrorResponses(400, 404)
  async get(@CurrentAccount() account: AccountRow, @Param() params: LockerItemIdParamsDto) {
    return this.withFiles(account.id, await this.locker.get(account.id, params.id));
  }

  @Post()
  @ZodResponse({ status: HttpStatus.CREATED, type: LockerItemResponseDto })
  @ApiErrorResponses(400)
  async create(@CurrentAccount() account: AccountRow, @Body() body: LockerItemInputDto) {
    return { item: toLockerItem(await this.locker.create(account.id, body)) };
  }

  /** Replaces the item's name, notes, count and spec; the kind cannot change (409). */
  @Put(':id')
  @ZodResponse({ status: HttpStatus.OK, type: LockerItemResponseDto })
  @ApiErrorResponses(400, 404, 409)
  async update(
    @CurrentAccount() account: AccountRow,
    @Param() params: LockerItemIdParamsDto,
    @Body() body: LockerItemInputDto,
  ) {
    return this.withFiles(account.id, await this.locker.update(account.id, params.id, body));
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiErrorResponses(400, 404)
  async delete(@CurrentAccount() account: AccountRow, @Param() params: LockerItemIdParamsDto): Promise<void> {
    await this.locker.delete(account.id, params.id);
  }

  private async withFiles(ownerId: string, row: Parameters<typeof toLockerItem>[0]) {
    const files = await this.locker.filesByItem(ownerId, [row.id]);
    return { item: toLockerItem(row, files.get(row.id)) };
  }
}
