import { Module } from '@nestjs/common';
import { BenchController } from './bench.controller';

/** Registered outside production only (AppModule): a benchmark needs it, readers do not. */
@Module({ controllers: [BenchController] })
export class BenchModule {}
