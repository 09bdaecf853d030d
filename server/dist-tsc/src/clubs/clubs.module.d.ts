export declare class ClubsModule {
}
