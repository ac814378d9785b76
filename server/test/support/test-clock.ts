import type { Clock } from '../../src/common/clock';

/** A clock the test moves by hand. */
export class TestClock implements Clock {
  constructor(private current: Date = new Date('2026-06-01T08:00:00.000Z')) {}

  now(): Date {
    return new Date(this.current.getTime());
  }

  advanceS(seconds: number): void {
    this.current = new Date(this.current.getTime() + seconds * 1000);
  }
}
