import { describe, expect, it } from 'vitest';
import { describeDevice } from '@server/modules/auth/devices.js';

// User-Agent strings in the formats the browsers publish (Chrome's and Safari's "Mozilla/5.0 (platform) …
// Version/… Safari/…" tokens, Firefox's "rv:… Gecko/… Firefox/…", Edge's "Edg/…"), parsed by bowser.
describe('a device in a few words, from its User-Agent', () => {
  it.each([
    ['Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/120.0.0.0 Mobile Safari/537.36', 'Chrome on an Android phone'],
    ['Mozilla/5.0 (iPhone; CPU iPhone OS 17_1 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.1 Mobile/15E148 Safari/604.1', 'Safari on an iOS phone'],
    ['Mozilla/5.0 (iPad; CPU OS 17_1 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.1 Mobile/15E148 Safari/604.1', 'Safari on an iOS tablet'],
    ['Mozilla/5.0 (Macintosh; Intel Mac OS X 10_15_7) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.1 Safari/605.1.15', 'Safari on a macOS computer'],
    ['Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:121.0) Gecko/20100101 Firefox/121.0', 'Firefox on a Windows computer'],
    ['Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/120.0.0.0 Safari/537.36 Edg/120.0.0.0', 'Microsoft Edge on a Windows computer'],
  ])('%s → %s', (ua, words) => {
    expect(describeDevice(ua)).toBe(words);
  });

  it('says so when the header is missing or names no browser; a huge header is cut before parsing', () => {
    expect(describeDevice(undefined)).toBe('A browser that did not say which');
    expect(describeDevice('')).toBe('A browser that did not say which');
    expect(describeDevice('curl/8.5.0')).toBe('A browser that did not say which');
    expect(describeDevice(`Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:121.0) Gecko/20100101 Firefox/121.0 ${'x'.repeat(100_000)}`)).toBe('Firefox on a Windows computer');
  });
});
