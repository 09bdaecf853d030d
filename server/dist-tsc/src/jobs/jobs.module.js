var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
import { Global, Module } from '@nestjs/common';
import { JobsService } from './jobs.service.js';
/** The job queue, shared by every module that sends or works jobs. */
let JobsModule = class JobsModule {
};
JobsModule = __decorate([
    Global(),
    Module({
        providers: [JobsService],
        exports: [JobsService],
    })
], JobsModule);
export { JobsModule };
//# sourceMappingURL=jobs.module.js.map