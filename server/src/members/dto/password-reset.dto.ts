import { EmailField, LinkTokenField, NewPasswordField } from './fields.js';

export class PasswordResetRequestDto {
  @EmailField()
  email: string;
}

export class PasswordResetConfirmDto {
  @LinkTokenField()
  token: string;

  @NewPasswordField()
  password: string;
}
