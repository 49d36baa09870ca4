import { type DynamicModule, Module, RequestMethod } from '@nestjs/common';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { ScheduleModule } from '@nestjs/schedule';
import { LoggerModule } from 'nestjs-pino';
import { JwtAuthGuard, RolesGuard } from './common/auth.guards';
import { CLOCK, systemClock } from './common/clock';
import { ErrorFilter } from './common/error.filter';
import { APP_CONFIG, type AppConfig } from './config';
import { DatabaseModule } from './db/database.module';
import { AuditModule } from './modules/audit/audit.module';
import { AuditLogModule } from './modules/audit-log/audit-log.module';
import { AuthModule } from './modules/auth/auth.module';
import { CommitteeReportModule } from './modules/committee-report/committee-report.module';
import { DebriefModule } from './modules/debrief/debrief.module';
import { DebriefMailModule } from './modules/debrief-mail/debrief-mail.module';
import { ExportsModule } from './modules/exports/exports.module';
import { HealthModule } from './modules/health/health.module';
import { ImportsModule } from './modules/imports/imports.module';
import { LinkModule } from './modules/link/link.module';
import { MailModule } from './modules/mail/mail.module';
import { ProfilesModule } from './modules/profiles/profiles.module';
import { ResuscitationsModule } from './modules/resuscitations/resuscitations.module';
import { SummariesModule } from './modules/summaries/summaries.module';
import { TrendsModule } from './modules/trends/trends.module';
import { ReviewsModule } from './modules/reviews/reviews.module';
import { SiteContextModule } from './modules/site-context/site-context.module';
import { SitesModule } from './modules/sites/sites.module';
import { UsersModule } from './modules/users/users.module';
import { WorkPoolModule } from './modules/work-pool/work-pool.module';

@Module({})
export class AppModule {
  static register(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      global: true,
      imports: [
        LoggerModule.forRoot({
          // Every route, in the path syntax of Express 5 (a bare `*` is converted with a warning).
          forRoutes: [{ path: '{*path}', method: RequestMethod.ALL }],
          pinoHttp: {
            level: config.logLevel,
            // Tokens and passwords never reach the log.
            redact: ['req.headers.authorization', 'req.body.password'],
            autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
            // One short line per request: the method, the address and the answer.
            serializers: {
              req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
              res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
            },
          },
        }),
        ScheduleModule.forRoot(),
        DatabaseModule,
        WorkPoolModule,
        AuditModule,
        AuthModule,
        HealthModule,
        LinkModule,
        ImportsModule,
        ResuscitationsModule,
        DebriefModule,
        ExportsModule,
        DebriefMailModule,
        SummariesModule,
        TrendsModule,
        CommitteeReportModule,
        ReviewsModule,
        SiteContextModule,
        MailModule,
        UsersModule,
        SitesModule,
        ProfilesModule,
        AuditLogModule,
      ],
      providers: [
        { provide: APP_CONFIG, useValue: config },
        { provide: CLOCK, useValue: { ...systemClock } },
        { provide: APP_GUARD, useClass: JwtAuthGuard },
        { provide: APP_GUARD, useClass: RolesGuard },
        { provide: APP_FILTER, useClass: ErrorFilter },
      ],
      exports: [APP_CONFIG, CLOCK],
    };
  }
}
