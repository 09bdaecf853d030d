import { Injectable, PipeTransform } from '@nestjs/common';
import { AppError } from '../common/app-error.js';

/** A photo's address is the hex SHA-256 of its bytes; case does not matter, lower case is kept. */
@Injectable()
export class Sha256Pipe implements PipeTransform<string, string> {
  transform(value: string): string {
    if (/^[0-9a-fA-F]{64}$/.test(value)) return value.toLowerCase();
    throw new AppError(400, 'validation_failed', `"${value.slice(0, 80)}" is not a photo address: it must be the 64 hexadecimal digits of the photo's SHA-256.`);
  }
}
