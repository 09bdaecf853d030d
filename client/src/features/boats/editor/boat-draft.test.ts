import { describe, expect, it } from 'vitest';
import { boatDraftOf, buildBoat, chamberId, newBoatDraft, type BoatDraft } from './boat-draft';

const PSI_PA = 6894.757293168361; // NIST SP 811 (2008) B.8: 1 psi = 6.894 757 E+03 Pa (exact from lbf and inch)

function filled(min: string, max: string): BoatDraft {
  const d = newBoatDraft();
  d.fleetNumber = 'IRB 3';
  d.name = 'Petrel';
  d.chambers = d.chambers.map((c) => ({ ...c, min: { text: min }, max: { text: max } }));
  return d;
}

describe('boat form to record', () => {
  it('stores a range typed in psi as kPa', () => {
    const built = buildBoat(filled('2.5', '3,5'), 'psi');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const port = built.fields.airChambers[0]!;
    expect(port.minKpa).toBeCloseTo(17.236893232920903, 9); // NIST SP 811 B.8
    expect(Math.abs(port.minKpa - (2.5 * PSI_PA) / 1000) / port.minKpa).toBeLessThan(1e-9);
    expect(Math.abs(port.maxKpa - (3.5 * PSI_PA) / 1000) / port.maxKpa).toBeLessThan(1e-9);
  });

  it('stores a range typed in mbar as kPa', () => {
    const built = buildBoat(filled('200', '240'), 'mbar');
    // NIST SP 811 B.8: 1 mbar = 100 Pa exactly.
    expect(built.ok && built.fields.airChambers[2]).toMatchObject({ minKpa: 20, maxKpa: 24 });
  });

  it('keeps a stored range exactly when the form is saved untouched', () => {
    const stored = buildBoat(filled('2.5', '3.5'), 'psi');
    if (!stored.ok) throw new Error('not built');
    const again = buildBoat(boatDraftOf(stored.fields, 'psi'), 'psi');
    expect(again.ok && again.fields.airChambers).toEqual(stored.fields.airChambers);
  });

  it('starts a new boat with three chambers, two side pontoons and the bow (common practice, no source)', () => {
    expect(newBoatDraft().chambers.map((c) => c.id)).toEqual(['port', 'starboard', 'bow']);
  });

  it('starts a new boat with the gear an IRB usually carries (common practice, no source)', () => {
    const gear = Object.fromEntries(newBoatDraft().gear.map((g) => [g.item, g.count]));
    expect(gear).toEqual({ 'Rescue tube': '1', Paddle: '2', 'Tow rope': '1', Knife: '1', Whistle: '1', 'Life jacket': '2', 'Waterproof radio': '1' });
  });

  it('says what is wrong with each box', () => {
    const d = filled('soft', '2');
    d.name = ' ';
    d.gear = [{ item: 'Paddle', count: '0' }];
    const built = buildBoat(d, 'kPa');
    expect(built.ok).toBe(false);
    expect(!built.ok && built.errors).toMatchObject({
      name: 'Enter the boat’s name.',
      'chambers.0.min': 'Enter the pressure as a number in kPa, such as 20.0.',
      'gear.0.count': 'Enter how many, a whole number from 1.',
    });
    expect(!built.ok && buildBoat(filled('25', '20'), 'kPa')).toMatchObject({ ok: false, errors: { 'chambers.0.min': 'The lowest pressure must not be above the highest.' } });
  });

  it('makes a chamber id from the name, unlike the others', () => {
    expect(chamberId('Port side pontoon', ['port'])).toBe('port-side-pontoon');
    expect(chamberId('Bow', ['bow'])).toBe('bow-2');
  });
});
