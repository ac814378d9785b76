import { Body, Controller, Get, HttpStatus, Param, Patch } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ZodResponse } from 'nestjs-zod';
import { Roles } from '../auth/decorators/roles.decorator';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import { AccountListResponseDto, AccountResponseDto } from '../users/account.dto';
import { toAccount } from '../users/account-view';
import { AccountsService } from '../users/accounts.service';
import { AccountIdParamsDto, AccountUpdateDto } from './admin.dto';

/** Admins list accounts and change a role or disable / enable an account. */
@ApiTags('admin')
@ApiSession()
@ApiErrorResponses(403)
@Roles('admin')
@Controller('admin/accounts')
export class AdminAccountsController {
  constructor(private readonly accounts: AccountsService) {}

  @Get()
  @ZodResponse({ status: HttpStatus.OK, type: AccountListResponseDto })
  async list() {
    const rows = await this.accounts.list();
    return { accounts: rows.map(toAccount) };
  }

  /** 409 when the change would leave no active admin. */
  @Patch(':id')
  @ZodResponse({ status: HttpStatus.OK, type: AccountResponseDto })
  @ApiErrorResponses(400, 404, 409)
  async update(@Param() params: AccountIdParamsDto, @Body() body: AccountUpdateDto) {
    const row = await this.accounts.update(params.id, body);
    return { account: toAccount(row) };
  }
}
