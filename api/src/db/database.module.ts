import { Global, Inject, Module, type OnModuleDestroy } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config';
import { createKnex, KNEX, type Db } from './knex';

@Global()
@Module({
  providers: [
    {
      provide: KNEX,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => createKnex(config.databaseUrl, config.dbPoolMax),
    },
  ],
  exports: [KNEX],
})
export class DatabaseModule implements OnModuleDestroy {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async onModuleDestroy(): Promise<void> {
    await this.db.destroy();
  }
}
