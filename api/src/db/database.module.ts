import { Global, Module, type DynamicModule } from '@nestjs/common';
import type { DatabaseHandle } from './database.js';

export const DATABASE = Symbol('DATABASE');

/**
 * Makes the process's Kysely instance injectable as DATABASE. The handle is opened by the app
 * factory, not here, because the session store must share the same pool before Nest starts.
 */
@Global()
@Module({})
export class DatabaseModule {
  static forRoot(handle: DatabaseHandle): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [{ provide: DATABASE, useValue: handle.db }],
      exports: [DATABASE],
    };
  }
}
