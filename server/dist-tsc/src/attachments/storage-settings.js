/** The keys the local fake accepts; used only when the endpoint is on this machine. */
const FAKE_KEY = 'S3RVER';
function isLoopback(endpoint) {
    const host = new URL(endpoint).hostname;
    return host === 'localhost' || host === '[::1]' || /^127\./.test(host);
}
/** How to reach the photo bucket, or null when photo storage is not configured. */
export function storageSettings(env) {
    if (!env.S3_ENDPOINT)
        return null;
    const keys = env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
        ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
        : isLoopback(env.S3_ENDPOINT) ? { accessKeyId: FAKE_KEY, secretAccessKey: FAKE_KEY } : undefined;
    return {
        bucket: env.S3_BUCKET,
        client: {
            endpoint: env.S3_ENDPOINT,
            region: env.S3_REGION,
            forcePathStyle: env.S3_FORCE_PATH_STYLE,
            // With the default (checksums on every request) the SDK frames the body in aws-chunked
            // encoding, which some S3-compatible stores keep as part of the object.
            requestChecksumCalculation: 'WHEN_REQUIRED',
            responseChecksumValidation: 'WHEN_REQUIRED',
            // A store that stops answering fails the request rather than holding it open.
            requestHandler: { connectionTimeout: 5_000, requestTimeout: 60_000 },
            ...(keys ? { credentials: keys } : {}),
        },
    };
}
//# sourceMappingURL=storage-settings.js.map