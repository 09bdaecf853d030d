import { ValidationPipe } from '@nestjs/common';
/** Whitelists DTO fields, refuses unknown ones and lists every bad field in `details`. */
export declare const appValidationPipe: () => ValidationPipe;
