import { EntitySchema } from 'typeorm';
export declare const KIND_ENTITIES: EntitySchema<any>[];
