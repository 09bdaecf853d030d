export declare class PasswordResetRequestDto {
    email: string;
}
export declare class PasswordResetConfirmDto {
    token: string;
    password: string;
}
