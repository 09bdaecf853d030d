import { type PipeTransform } from '@nestjs/common';
/**
 * Passes a body through untouched: sync bodies are checked by sync-protocol's own schemas, so the
 * global class-validator pipe (which needs a DTO class) must not strip them.
 */
export declare class RawBody implements PipeTransform {
    transform(value: unknown): unknown;
}
