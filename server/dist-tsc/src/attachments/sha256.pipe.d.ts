import { PipeTransform } from '@nestjs/common';
/** A photo's address is the hex SHA-256 of its bytes; case does not matter, lower case is kept. */
export declare class Sha256Pipe implements PipeTransform<string, string> {
    transform(value: string): string;
}
