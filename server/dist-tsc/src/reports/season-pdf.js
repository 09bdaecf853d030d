import PDFDocument from 'pdfkit';
import { TRIP_PURPOSES, utcToLocal } from '@breakline/sync-protocol';
import { pdfSafe } from './pdf-text.js';
const PURPOSE_WORDS = {
    patrol: 'Patrol', training: 'Training', rescue: 'Rescue', search: 'Search', 'preventive-action': 'Preventive action',
    'event-support': 'Event support', 'maintenance-run': 'Maintenance run',
};
const NAVY = '#12304a';
const GREY = '#5a6470';
export const hours = (h) => `${h.toFixed(1)} h`;
const boatLabel = (b) => [b.fleetNumber, b.boatName].filter(Boolean).join(' ') || `boat ${b.boatId.slice(-6)}`;
/** The season report for the club's committee: the same figures as the desk's charts, as tables. */
export async function renderSeasonPdf(r) {
    const doc = new PDFDocument({ size: 'A4', margin: 50, info: { Title: pdfSafe(`Season report ${r.from} to ${r.to}`), Author: 'Breakline', Subject: pdfSafe(r.club.name) } });
    const chunks = [];
    doc.on('data', (c) => chunks.push(c));
    const done = new Promise((resolve, reject) => {
        doc.on('end', () => resolve(Buffer.concat(chunks)));
        doc.on('error', reject);
    });
    const text = (s, opts) => doc.text(pdfSafe(s), opts);
    const heading = (s) => {
        ensureRoom(doc, 60);
        doc.moveDown(0.8).font('Helvetica-Bold').fontSize(13).fillColor(NAVY);
        text(s);
        doc.moveDown(0.3).font('Helvetica').fontSize(10).fillColor('black');
    };
    const made = utcToLocal(r.generatedAt, r.club.timeZone);
    doc.font('Helvetica-Bold').fontSize(20).fillColor(NAVY);
    text('Season report');
    doc.font('Helvetica').fontSize(12).fillColor('black');
    text(r.club.name);
    doc.fontSize(10).fillColor(GREY);
    text(`${r.from} to ${r.to} (dates at the club, ${r.club.timeZone}). Made ${made.date} ${made.time}.`);
    doc.fillColor('black');
    heading('Summary');
    const median = r.defects.medianHoursToRepair;
    const summary = [
        ['Trips', `${r.trips.total}${r.trips.open ? ` (${r.trips.open} not yet retrieved, left out of the hours)` : ''}`],
        ['Hours on the water', hours(r.hoursOnWater.total)],
        ['Rescues', `${r.rescues.incidents} (${r.rescues.persons} people)`],
        ['Assists', `${r.assists.incidents} (${r.assists.persons} people)`],
        ['Defects raised', String(r.defects.raised)],
        ['Defects closed', `${r.defects.closed} (returned to service or found not to be a defect)`],
        ['Median time from report to repair', median === null ? 'no repairs recorded' : `${hours(median)} over ${r.defects.repairedCount} repaired defects`],
    ];
    table(doc, ['Figure', 'Value'], summary, [200, 295]);
    heading('Trips by purpose');
    table(doc, ['Purpose', 'Trips'], TRIP_PURPOSES.map((p) => [PURPOSE_WORDS[p] ?? p, String(r.trips.byPurpose[p] ?? 0)]), [200, 80]);
    heading('Hours on the water per boat');
    table(doc, ['Boat', 'Hours'], r.hoursOnWater.byBoat.map((b) => [boatLabel(b), hours(b.totalHours)]), [200, 80]);
    heading('Hours on the water per boat by week (weeks start on Monday)');
    const boats = r.hoursOnWater.byBoat.slice(0, 5);
    const weekRows = r.weeks.map((w, i) => [w, ...boats.map((b) => (b.weekly[i] ? b.weekly[i].toFixed(1) : '-'))]);
    // Columns are narrow: the fleet number names the boat (the table above gives the names).
    table(doc, ['Week of', ...boats.map((b) => b.fleetNumber ?? boatLabel(b))], weekRows, [90, ...boats.map(() => 81)]);
    if (r.hoursOnWater.byBoat.length > boats.length) {
        doc.fillColor(GREY);
        text(`${r.hoursOnWater.byBoat.length - boats.length} more boats are in the desk's season report and its CSV.`);
        doc.fillColor('black');
    }
    heading('Defects by week');
    table(doc, ['Week of', 'Raised', 'Returned to service'], r.defects.weekly.map((d) => [d.week, String(d.raised), String(d.returnedToService)]), [90, 80, 140]);
    doc.moveDown(1.5).fontSize(9).fillColor(GREY);
    text('Figures come from the records crews and supervisors synced to Breakline. They do not replace the report the governing body requires; '
        + "the club's procedures come first.");
    doc.end();
    return done;
}
function ensureRoom(doc, needed) {
    if (doc.y + needed > doc.page.height - doc.page.margins.bottom)
        doc.addPage();
}
/** A plain table: a bold header row, then one line a row; a long table carries on to the next page under a repeated header. */
function table(doc, headers, rows, widths) {
    const left = doc.page.margins.left;
    const rowHeight = 15;
    const line = (cells, bold) => {
        ensureRoom(doc, rowHeight);
        const y = doc.y;
        doc.font(bold ? 'Helvetica-Bold' : 'Helvetica').fontSize(10);
        let x = left;
        cells.forEach((c, i) => {
            doc.text(pdfSafe(c), x, y, { width: widths[i] - 6, lineBreak: false, ellipsis: true });
            x += widths[i];
        });
        doc.x = left;
        doc.y = y + rowHeight;
    };
    line(headers, true);
    for (const r of rows) {
        if (doc.y + rowHeight > doc.page.height - doc.page.margins.bottom) {
            doc.addPage();
            line(headers, true);
        }
        line(r, false);
    }
    doc.font('Helvetica');
}
//# sourceMappingURL=season-pdf.js.map