import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import {
  type RecordReferenceAnswer,
  recordReferenceAnswerSchema,
  slugParamSchema,
  type UnexplainedDisagreements,
  unexplainedDisagreementsSchema,
  type WordLocale,
} from '@homeground/shared';
import { AnswersInLanguage, RequestLocale } from '../common/decorators/request-locale.decorator.js';
import { Auth } from '../common/decorators/auth.decorator.js';
import { ZodParam, ZodResponse } from '../common/decorators/zod.decorators.js';
import { SpeciesReferenceService } from './species-reference.service.js';

/** The curator's desk: the catalogue checked against the open reference data. */
@ApiTags('species')
@Controller('reference-checks')
export class SpeciesReferenceController {
  constructor(private readonly reference: SpeciesReferenceService) {}

  /** Differences between records and the reference that no record explains yet, with their count. */
  @Get()
  @ZodResponse(unexplainedDisagreementsSchema)
  @Auth('curator')
  unexplained(): UnexplainedDisagreements {
    return this.reference.unexplained();
  }

  /** One record beside the reference, field by field, with agreements, differences and the record's notes. */
  @Get(':slug')
  @ZodResponse(recordReferenceAnswerSchema)
  @Auth('curator')
  @AnswersInLanguage()
  record(@ZodParam('slug', slugParamSchema) slug: string, @RequestLocale() locale: WordLocale): RecordReferenceAnswer {
    return this.reference.record(slug, locale);
  }
}
