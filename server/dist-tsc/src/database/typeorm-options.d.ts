import type { DataSourceOptions } from 'typeorm';
/** One place for connection options: the schema comes from migrations, never synchronize. */
export declare function typeormOptions(url: string): DataSourceOptions;
