import { expect } from 'chai';
import { LocalTimeResolver } from '../../../shared/logs/local-time-resolver.js';

/** Local America/Chicago clock readings, resolved in file order, as ISO UTC (or 'gap'). */
function resolveAll(zone: string, locals: string[]): string[] {
  const resolver = new LocalTimeResolver(zone);
  return locals.map((local) => {
    const at = resolver.resolve(Date.parse(`${local}:00Z`));
    return Number.isNaN(at) ? 'gap' : new Date(at).toISOString().slice(0, 16);
  });
}

// Offsets and clock changes from the IANA tz database, zone America/Chicago:
// CST −06:00, CDT −05:00; 2026-03-08 02:00 CST → 03:00 CDT; 2026-11-01 02:00 CDT → 01:00 CST.
describe('LocalTimeResolver', () => {
  it('reads winter times as CST (−06:00) and summer times as CDT (−05:00)', () => {
    expect(resolveAll('America/Chicago', ['2026-01-15T12:00', '2026-07-01T12:00'])).to.deep.equal([
      '2026-01-15T18:00', // IANA tz: CST
      '2026-07-01T17:00', // IANA tz: CDT
    ]);
  });

  it('reads the repeated hour of 2026-11-01 as CDT first, then as CST once the clock goes back', () => {
    const locals = ['00:30', '00:45', '01:00', '01:15', '01:30', '01:45', '01:00', '01:15', '01:30', '01:45', '02:00'];
    expect(resolveAll('America/Chicago', locals.map((t) => `2026-11-01T${t}`))).to.deep.equal([
      '2026-11-01T05:30', // IANA tz: CDT −05:00
      '2026-11-01T05:45',
      '2026-11-01T06:00', // first pass: CDT
      '2026-11-01T06:15',
      '2026-11-01T06:30',
      '2026-11-01T06:45',
      '2026-11-01T07:00', // second pass: CST −06:00
      '2026-11-01T07:15',
      '2026-11-01T07:30',
      '2026-11-01T07:45',
      '2026-11-01T08:00', // IANA tz: CST
    ]);
  });

  it('tells the two passes apart in an hourly log where 01:00 simply appears twice', () => {
    const locals = ['2026-11-01T00:00', '2026-11-01T01:00', '2026-11-01T01:00', '2026-11-01T02:00'];
    expect(resolveAll('America/Chicago', locals)).to.deep.equal([
      '2026-11-01T05:00',
      '2026-11-01T06:00', // IANA tz: CDT
      '2026-11-01T07:00', // IANA tz: CST
      '2026-11-01T08:00',
    ]);
  });

  it('does not switch passes on a repeated row in a minutely log', () => {
    const locals = ['2026-11-01T01:04', '2026-11-01T01:05', '2026-11-01T01:05', '2026-11-01T01:06'];
    expect(resolveAll('America/Chicago', locals)).to.deep.equal([
      '2026-11-01T06:04',
      '2026-11-01T06:05',
      '2026-11-01T06:05', // same instant again: the reader drops it as a duplicate
      '2026-11-01T06:06',
    ]);
  });

  it('has no instant for 02:00–02:59 on 2026-03-08', () => {
    const locals = ['2026-03-08T01:59', '2026-03-08T02:00', '2026-03-08T02:30', '2026-03-08T02:59', '2026-03-08T03:00'];
    expect(resolveAll('America/Chicago', locals)).to.deep.equal([
      '2026-03-08T07:59', // IANA tz: CST
      'gap',
      'gap',
      'gap',
      '2026-03-08T08:00', // IANA tz: CDT
    ]);
  });

  it('takes fixed zones without clock changes', () => {
    expect(resolveAll('UTC', ['2026-11-01T01:30', '2026-11-01T01:30'])).to.deep.equal(['2026-11-01T01:30', '2026-11-01T01:30']);
    expect(resolveAll('UTC-6', ['2026-07-01T12:00'])).to.deep.equal(['2026-07-01T18:00']);
  });

  it('refuses unknown zones and the host zone', () => {
    expect(() => new LocalTimeResolver('Mars/Olympus')).to.throw(RangeError, /unknown time zone/);
    expect(() => new LocalTimeResolver('local')).to.throw(RangeError);
    expect(() => new LocalTimeResolver('system')).to.throw(RangeError);
  });
});
