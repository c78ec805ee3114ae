import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { type OutboxMessage, outboxQuerySchema } from '@homeground/shared';
import type { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { OutboxService } from './outbox.service.js';

/** What the local mail server received: organisers read their group's mail, admins all of it. */
@ApiTags('outbox')
@Controller('outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Get()
  @Auth()
  list(
    @Query(new ZodValidationPipe(outboxQuerySchema)) query: z.infer<typeof outboxQuerySchema>,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<OutboxMessage[]> {
    return this.outbox.list(user, query);
  }

  @Get(':id')
  @Auth()
  get(@Param('id', new ParseUUIDPipe({ version: '4' })) id: string, @CurrentUser() user: AuthenticatedUser): Promise<OutboxMessage> {
    return this.outbox.get(user, id);
  }
}
