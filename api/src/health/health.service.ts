import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { ENGINE_VERSION } from '@loftwright/buoyancy';
import { DataSource } from 'typeorm';
import { API_VERSION } from '../config/app-info';
import { Installation } from './installation.entity';

export interface HealthReport {
  status: 'ok' | 'error';
  version: string;
  engineVersion: string;
  database: 'ok' | 'error';
  databaseCreatedAt?: string;
  pendingMigrations?: boolean;
}

@Injectable()
export class HealthService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async check(): Promise<HealthReport> {
    const base = { version: API_VERSION, engineVersion: ENGINE_VERSION };
    try {
      const installation = await this.dataSource
        .getRepository(Installation)
        .findOneByOrFail({ id: 1 });
      const pendingMigrations = await this.dataSource.showMigrations();
      return {
        ...base,
        status: pendingMigrations ? 'error' : 'ok',
        database: 'ok',
        databaseCreatedAt: installation.createdAt,
        pendingMigrations,
      };
    } catch {
      return { ...base, status: 'error', database: 'error' };
    }
  }
}
