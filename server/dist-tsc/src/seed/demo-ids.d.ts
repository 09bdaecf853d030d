/** A stable uuid (version 7 layout) for a demo record, so seeding twice names the same records. */
export declare function demoId(name: string): string;
