import { Body, Controller, Get, Header, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import type { Response } from 'express';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { PULL_CHECKPOINT_HEADER, PULL_HAS_MORE_HEADER, type ConflictRecord, type PushResponse } from '@breakline/sync-protocol';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import { PushService } from './push.service.js';
import { PullService } from './pull.service.js';
import { ConflictsService } from './conflicts.service.js';
import { RawBody } from './raw-body.js';

/** The sync contract, version 1: bodies are validated by sync-protocol's schemas in the services. */
@ApiTags('sync')
@ApiBearerAuth()
@Controller('sync')
export class SyncController {
  constructor(private readonly pushes: PushService, private readonly pulls: PullService, private readonly conflicts: ConflictsService) {}

  @Post('push')
  @HttpCode(200)
  push(@CurrentPrincipal() p: Principal, @Body(RawBody) body: unknown): Promise<PushResponse> {
    return this.pushes.push(p, body);
  }

  /** A PullResponse, sent as the JSON text the service put together; its checkpoint and hasMore also as headers. */
  @Get('pull')
  @Header('Content-Type', 'application/json; charset=utf-8')
  async pull(@CurrentPrincipal() p: Principal, @Query(RawBody) query: Record<string, unknown>, @Res({ passthrough: true }) res: Response): Promise<string> {
    const page = await this.pulls.pull(p, query);
    res.setHeader(PULL_CHECKPOINT_HEADER, page.checkpoint);
    res.setHeader(PULL_HAS_MORE_HEADER, String(page.hasMore));
    return page.json;
  }

  /** What a phone shows in its sync status; any member may ask. */
  @Get('status')
  async status(@CurrentPrincipal() p: Principal): Promise<{ openConflicts: number }> {
    return { openConflicts: await this.conflicts.openCount(p) };
  }

  @Get('conflicts')
  @MinRole('supervisor')
  list(@CurrentPrincipal() p: Principal, @Query('status') status?: string): Promise<ConflictRecord[]> {
    const s = status === 'settled' || status === 'all' ? status : 'open';
    return this.conflicts.list(p, s);
  }

  @Post('conflicts/:id/settle')
  @HttpCode(200)
  @MinRole('supervisor')
  settle(@CurrentPrincipal() p: Principal, @Param('id', ParseUUIDPipe) id: string, @Body(RawBody) body: Record<string, unknown>): Promise<ConflictRecord> {
    return this.conflicts.settle(p, id, body);
  }
}
