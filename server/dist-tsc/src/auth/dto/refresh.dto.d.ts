export declare class RefreshDto {
    refreshToken: string;
}
export declare class SwitchClubDto extends RefreshDto {
    clubId: string;
}
