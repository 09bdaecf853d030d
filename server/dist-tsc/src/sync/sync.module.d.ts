export declare class SyncModule {
}
