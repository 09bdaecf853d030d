import type { DataSource } from 'typeorm';
/** Writes the demo scenario; running it again changes nothing that is already there. */
export declare function seedDemo(db: DataSource): Promise<{
    created: number;
}>;
