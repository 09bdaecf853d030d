import { Foundation1796157054596 } from './1796157054596-Foundation.js';
export declare const MIGRATIONS: (typeof Foundation1796157054596)[];
