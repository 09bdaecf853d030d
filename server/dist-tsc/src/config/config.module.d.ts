/** Provides the validated settings as the `Env` class, read once. */
export declare class AppConfigModule {
}
