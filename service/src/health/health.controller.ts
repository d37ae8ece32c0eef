import { Controller, Get, Inject } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { sql } from 'drizzle-orm';
import type { DatabaseHandle } from '@fuelwright/db';
import { Public } from '../common/decorators/public.decorator.js';
import { DB_HANDLE } from '../database/database.tokens.js';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@Inject(DB_HANDLE) private readonly handle: DatabaseHandle) {}

  @Public()
  @Get()
  async health(): Promise<{ status: 'ok'; database: string }> {
    await this.handle.db.execute(sql`select 1`);
    return { status: 'ok', database: this.handle.kind };
  }
}
