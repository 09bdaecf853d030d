/** Mail nobody asked for but somebody needs: stand-down alerts, awards about to lapse. */
export declare class AlertsModule {
}
