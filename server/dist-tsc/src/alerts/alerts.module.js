var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Module } from '@nestjs/common';
import { StandDownAlertsService } from './stand-down-alerts.service.js';
import { AwardRemindersService } from './award-reminders.service.js';
/** Mail nobody asked for but somebody needs: stand-down alerts, awards about to lapse. */
let AlertsModule = class AlertsModule {
};
AlertsModule = __decorate([
    Module({
        providers: [StandDownAlertsService, AwardRemindersService],
        exports: [StandDownAlertsService, AwardRemindersService],
    })
], AlertsModule);
export { AlertsModule };
//# sourceMappingURL=alerts.module.js.map