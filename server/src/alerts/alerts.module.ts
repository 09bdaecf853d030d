import { Module } from '@nestjs/common';
import { StandDownAlertsService } from './stand-down-alerts.service.js';
import { AwardRemindersService } from './award-reminders.service.js';

/** Mail nobody asked for but somebody needs: stand-down alerts, awards about to lapse. */
@Module({
  providers: [StandDownAlertsService, AwardRemindersService],
  exports: [StandDownAlertsService, AwardRemindersService],
})
export class AlertsModule {}
