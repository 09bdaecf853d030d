import type { DataSource } from 'typeorm';
export interface DemoPeople {
    admin: string;
    captain: string;
    driver: string;
    crew: string;
}
export declare function seedDemoRecords(db: DataSource, clubId: string, people: DemoPeople, now?: Date): Promise<number>;
