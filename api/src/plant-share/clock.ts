import { Injectable } from '@nestjs/common';

/**
 * The plant share's clock: "a slot in the past" and "names kept no longer than the retention" are
 * both about now. Tests move it (jest.spyOn(app.get(Clock), 'now')) instead of waiting.
 */
@Injectable()
export class Clock {
  now(): Date {
    return new Date();
  }
}
