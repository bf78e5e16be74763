import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { clockSpan, clockText, toClockStyle } from '@shared/domain/clock';

// Outside reference: ECMA-402 Intl.DateTimeFormat with CLDR data (Node's ICU). en-US writes the 12-hour clock
// ("8:33 AM", noon "12:00 PM", midnight "12:00 AM"); en-GB with hourCycle h23 the 24-hour one ("08:33"). ICU puts a
// narrow no-break space before AM/PM; our words use a plain space (the PDFs' fonts and e-mails read it everywhere).
const us = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit', timeZone: 'UTC' });
const gb = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone: 'UTC' });
const at = (minute: number) => new Date(Date.UTC(2026, 0, 4, 0, minute));
const hhmm = (minute: number) => `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;

describe('a time of day in words', () => {
  it('matches Intl en-US (12-hour) and en-GB h23 (24-hour) for every minute of a day', () => {
    for (let m = 0; m < 1440; m++) {
      expect(clockText(hhmm(m), '12h')).toBe(us.format(at(m)).replace(/\s/g, ' '));
      expect(clockText(hhmm(m), '24h')).toBe(gb.format(at(m)));
    }
  });

  it('reads a local date-time as its time; noon and midnight by the US convention', () => {
    expect(clockText('2026-01-04T08:33', '12h')).toBe('8:33 AM');
    expect(clockText('2026-01-04T08:33', '24h')).toBe('08:33');
    expect(clockText('12:00', '12h')).toBe('12:00 PM');
    expect(clockText('00:00', '12h')).toBe('12:00 AM');
    expect(clockText('2026-01-04T23:59:30', '12h')).toBe('11:59 PM');
    expect(() => clockText('8:33', '12h')).toThrow(RangeError);
    expect(() => clockText('2026-01-04', '24h')).toThrow(RangeError);
  });

  it('writes a span with one AM/PM when both ends share it', () => {
    expect(clockSpan('2026-01-04T08:12', '2026-01-04T08:37', '12h')).toBe('8:12–8:37 AM');
    expect(clockSpan('11:50', '12:15', '12h')).toBe('11:50 AM–12:15 PM');
    expect(clockSpan('08:12', '08:37', '24h')).toBe('08:12–08:37');
  });

  it('reads a stored value as 24-hour unless it is 12-hour', () => {
    expect(toClockStyle('12h')).toBe('12h');
    expect(toClockStyle('24h')).toBe('24h');
    expect(toClockStyle(null)).toBe('24h');
    expect(toClockStyle('sundial')).toBe('24h');
  });

  it('the two styles name the same minute (property: 12-hour words read back to the 24-hour time)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1439 }), (m) => {
        const [, h, mm, half] = clockText(hhmm(m), '12h').match(/^(\d{1,2}):(\d{2}) (AM|PM)$/)!;
        const back = (Number(h) % 12) + (half === 'PM' ? 12 : 0);
        expect(`${String(back).padStart(2, '0')}:${mm}`).toBe(clockText(hhmm(m), '24h'));
      }),
    );
  });
});
