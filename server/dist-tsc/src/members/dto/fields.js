import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
export const NEW_PASSWORD_MIN = 10;
/** An e-mail address, trimmed and lower-cased the way users.email is stored. */
export const EmailField = () => applyDecorators(ApiProperty({ example: 'new.member@example.org' }), Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value)), 
// class-validator runs the lowest decorator first; stopAtFirstError keeps one message a field.
MaxLength(254, { message: 'An e-mail address is at most 254 characters.' }), IsEmail({}, { message: 'Enter an e-mail address such as name@example.org.' }));
/** A password someone is choosing now. */
export const NewPasswordField = () => applyDecorators(ApiProperty({ minLength: NEW_PASSWORD_MIN, maxLength: 200 }), MaxLength(200, { message: 'A password is at most 200 characters.' }), MinLength(NEW_PASSWORD_MIN, { message: `Choose a password of at least ${NEW_PASSWORD_MIN} characters; a few words strung together work well.` }), IsString({ message: 'Choose a password.' }));
/** A token from a mailed link. */
export const LinkTokenField = () => applyDecorators(ApiProperty({ description: 'The token from the link in the e-mail (the part after #token=).' }), MaxLength(300, { message: 'This link is not a Breakline link; open the whole link from the e-mail.' }), MinLength(10, { message: 'This link is not a Breakline link; open the whole link from the e-mail.' }), IsString({ message: 'The token from the e-mailed link is missing; open the whole link from the e-mail.' }));
//# sourceMappingURL=fields.js.map