import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { Membership } from './membership.entity.js';

@Injectable()
export class MembershipsService {
  constructor(@InjectRepository(Membership) private readonly repo: Repository<Membership>) {}

  findById(id: string) {
    return this.repo.findOne({ where: { id } });
  }

  /** A person's memberships with their clubs, oldest first (the default club is the first). */
  forUser(userId: string) {
    return this.repo.find({ where: { userId }, relations: { club: true }, order: { createdAt: 'ASC' } });
  }

  /** Members of one club: always filtered by the caller's club id. */
  inClub(clubId: string) {
    return this.repo.find({ where: { clubId }, relations: { user: true }, order: { createdAt: 'ASC' } });
  }
}
