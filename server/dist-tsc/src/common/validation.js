import { ValidationPipe } from '@nestjs/common';
import { AppError } from './app-error.js';
function flatten(errors, prefix = '') {
    return errors.flatMap((e) => {
        const field = prefix ? `${prefix}.${e.property}` : e.property;
        const own = Object.values(e.constraints ?? {}).map((message) => ({ field, message }));
        return [...own, ...flatten(e.children ?? [], field)];
    });
}
/** Whitelists DTO fields, refuses unknown ones and lists every bad field in `details`. */
export const appValidationPipe = () => new ValidationPipe({
    whitelist: true,
    stopAtFirstError: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new AppError(400, 'validation_failed', 'Some fields need fixing.', flatten(errors)),
});
//# sourceMappingURL=validation.js.map