import { Module } from '@nestjs/common';
import { AdminScopeRepository } from './admin-scope.repository';
import { AdminScopeService } from './admin-scope.service';

@Module({ providers: [AdminScopeRepository, AdminScopeService], exports: [AdminScopeService] })
export class AdminScopeModule {}
