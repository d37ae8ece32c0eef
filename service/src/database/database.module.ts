import { Global, Inject, Logger, Module, type DynamicModule, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { openDatabase, seedDemoIfEmpty, type DatabaseHandle } from '@fuelwright/db';
import { join } from 'node:path';
import type { AppConfig } from '../config/app.config.js';
import { hashPassword } from '../auth/password.js';
import { DB, DB_HANDLE, DEMO_JUST_SEEDED } from './database.tokens.js';

/** Handles whose opening just seeded the demo club (DEMO_JUST_SEEDED reads it). */
const justSeeded = new WeakSet<DatabaseHandle>();

export interface DatabaseModuleOptions {
  /** An already opened and migrated database (tests hand one in). */
  handle?: DatabaseHandle;
}

/** Opens the database named by the configuration, applies the migrations and seeds the demo club. */
async function openConfigured(config: AppConfig): Promise<DatabaseHandle> {
  const log = new Logger('Database');
  const handle = await openDatabase(
    config.databaseUrl ? { databaseUrl: config.databaseUrl } : { dataDir: join(config.dataDir, 'pglite') },
  );
  await handle.migrate();
  log.log(config.databaseUrl ? 'PostgreSQL server: migrations applied' : `PGlite in ${config.dataDir}: migrations applied`);
  if (config.seedDemo && (await seedDemoIfEmpty(handle.db, hashPassword))) {
    log.log('Empty database: demo club seeded (invented data, demo sign-ins in README.md)');
    justSeeded.add(handle);
  }
  return handle;
}

@Global()
@Module({})
export class DatabaseModule implements OnApplicationShutdown {
  constructor(@Inject(DB_HANDLE) private readonly handle: DatabaseHandle) {}

  static forRoot(options: DatabaseModuleOptions = {}): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [
        options.handle
          ? { provide: DB_HANDLE, useValue: options.handle }
          : {
              provide: DB_HANDLE,
              inject: [ConfigService],
              useFactory: (config: ConfigService) => openConfigured(config.getOrThrow<AppConfig>('app')),
            },
        { provide: DB, inject: [DB_HANDLE], useFactory: (h: DatabaseHandle) => h.db },
        { provide: DEMO_JUST_SEEDED, inject: [DB_HANDLE], useFactory: (h: DatabaseHandle) => justSeeded.has(h) },
      ],
      exports: [DB, DB_HANDLE, DEMO_JUST_SEEDED],
    };
  }

  async onApplicationShutdown(): Promise<void> {
    await this.handle.close();
  }
}
