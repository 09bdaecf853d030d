import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const PRESSURE_UNITS = ['kPa', 'psi', 'bar', 'mbar'] as const;
export const WIND_UNITS = ['kn', 'km/h', 'm/s'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type WindUnit = (typeof WIND_UNITS)[number];
/** What sign-on does for a member without a current award for the role: warn, or refuse. */
export const AWARD_CHECKS = ['warn', 'block'] as const;
export type AwardCheck = (typeof AWARD_CHECKS)[number];

/** A surf lifesaving club: the tenant every club-owned row points to. */
@Entity('clubs')
export class Club {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text', unique: true })
  slug: string;

  /** IANA time-zone name, e.g. Australia/Sydney. */
  @Column({ name: 'time_zone', type: 'text' })
  timeZone: string;

  /** WGS 84 degrees of the patrolled beach, for daylight warnings. */
  @Column({ type: 'double precision' })
  latitude: number;

  @Column({ type: 'double precision' })
  longitude: number;

  @Column({ name: 'pressure_unit', type: 'text', default: 'kPa' })
  pressureUnit: PressureUnit;

  @Column({ name: 'wind_unit', type: 'text', default: 'kn' })
  windUnit: WindUnit;

  @Column({ name: 'award_check', type: 'text', default: 'warn' })
  awardCheck: AwardCheck;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
