import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type OutboxMessage,
  outboxMessageSchema,
  type OutboxQuery,
  outboxQuerySchema,
  uuidParamSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { z } from 'zod';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { ZodParam, ZodQuery, ZodResponse } from '../common/decorators/zod.decorators.js';
import { OutboxService } from './outbox.service.js';

/** What the local mail server received: organisers read their group's mail, admins all of it. */
@ApiTags('outbox')
@AnswersInLanguage()
@Controller('outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Get()
  @Auth()
  @ZodResponse(z.array(outboxMessageSchema))
  list(
    @ZodQuery(outboxQuerySchema) query: OutboxQuery,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<OutboxMessage[]> {
    return this.outbox.list(user, query, locale);
  }

  @Get(':id')
  @Auth()
  @ZodResponse(outboxMessageSchema)
  get(
    @ZodParam('id', uuidParamSchema) id: string,
    @CurrentUser() user: AuthenticatedUser,
    @RequestLocale() locale: WordLocale,
  ): Promise<OutboxMessage> {
    return this.outbox.get(user, id, locale);
  }
}
