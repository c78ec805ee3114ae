import { PayloadTooLargeException } from '@nestjs/common';

/**
 * A 413 whose message says what was too large and the limit (e.g. a photo's pixels). The error
 * filter keeps its words; other 413s (body-parser, upload limits) get one plain sentence.
 */
export class TooLargeWithReason extends PayloadTooLargeException {}
