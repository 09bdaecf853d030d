import 'reflect-metadata';
import { DataSource } from 'typeorm';
/** Opens a data source for a command-line task, with a sentence if the database is unreachable. */
export declare function openDatabase(): Promise<DataSource>;
