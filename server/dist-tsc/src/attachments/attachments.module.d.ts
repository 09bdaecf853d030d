/** Photo uploads and downloads; the bytes live in an S3-compatible store. */
export declare class AttachmentsModule {
}
