import { type DynamicModule, Global, Module } from '@nestjs/common';
import { CLOCK, type Clock, systemClock } from './clock';

/** Provides `CLOCK` everywhere: the wall clock, or the one a test hands in. */
@Global()
@Module({})
export class ClockModule {
  static forRoot(clock: Clock = systemClock): DynamicModule {
    return { module: ClockModule, providers: [{ provide: CLOCK, useValue: clock }], exports: [CLOCK] };
  }
}
