export declare function pdfSafe(s: string): string;
