import { DataSource } from 'typeorm';
export declare class HealthController {
    private readonly db;
    constructor(db: DataSource);
    /** Liveness and database reachability, for the start script and load balancers. */
    health(): Promise<{
        status: string;
    }>;
}
