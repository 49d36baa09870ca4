import { Module } from '@nestjs/common';
import { AdminScopeRepository } from './admin-scope.repository';

@Module({ providers: [AdminScopeRepository], exports: [AdminScopeRepository] })
export class AdminScopeModule {}
