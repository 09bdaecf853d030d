import { weekOf } from './season.service.js';
import { pdfSafe } from './pdf-text.js';
describe('weeks of the season report', () => {
    // ISO 8601 weeks start on Monday. The reference is JavaScript's own calendar (getUTCDay, 1 = Monday),
    // independent of the day count weekOf uses.
    it('puts every day of a week under its Monday', () => {
        for (let d = 0; d < 800; d++) {
            const date = new Date(Date.UTC(2025, 0, 1) + d * 86_400_000).toISOString().slice(0, 10);
            const monday = weekOf(date);
            expect(new Date(`${monday}T00:00:00Z`).getUTCDay()).toBe(1);
            const gap = (Date.parse(`${date}T00:00:00Z`) - Date.parse(`${monday}T00:00:00Z`)) / 86_400_000;
            expect(gap).toBeGreaterThanOrEqual(0);
            expect(gap).toBeLessThan(7);
        }
        expect(weekOf('2025-01-12')).toBe('2025-01-06');
        expect(weekOf('2025-01-13')).toBe('2025-01-13');
        expect(weekOf('1969-12-31')).toBe('1969-12-29');
    });
});
describe('text in the PDF', () => {
    it('keeps what the built-in font can print and folds the rest to its base letter', () => {
        expect(pdfSafe('Gannet Bay — “IRB 2” 12.5 h • café')).toBe('Gannet Bay — “IRB 2” 12.5 h • café');
        expect(pdfSafe('Tāmaki Makaurau Ōrākei')).toBe('Tamaki Makaurau Orakei');
        expect(pdfSafe('救生艇')).toBe('???');
    });
});
//# sourceMappingURL=season-week.spec.js.map