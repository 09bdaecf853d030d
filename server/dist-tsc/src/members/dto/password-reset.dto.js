var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { EmailField, LinkTokenField, NewPasswordField } from './fields.js';
export class PasswordResetRequestDto {
    email;
}
__decorate([
    EmailField(),
    __metadata("design:type", String)
], PasswordResetRequestDto.prototype, "email", void 0);
export class PasswordResetConfirmDto {
    token;
    password;
}
__decorate([
    LinkTokenField(),
    __metadata("design:type", String)
], PasswordResetConfirmDto.prototype, "token", void 0);
__decorate([
    NewPasswordField(),
    __metadata("design:type", String)
], PasswordResetConfirmDto.prototype, "password", void 0);
//# sourceMappingURL=password-reset.dto.js.map