import { Global, Module } from '@nestjs/common';
import { WorkPool } from './work-pool.service';

/** Worker threads for analysis and PDF rendering, shared by every module. */
@Global()
@Module({ providers: [WorkPool], exports: [WorkPool] })
export class WorkPoolModule {}
