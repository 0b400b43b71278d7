import * as core from '../core/crypto';
import { reportStage } from './mail.service';
import { fillSecrets, openSecrets, sealSecrets, withPlaceholders } from './outbox-secrets';
import { esc } from './templates/layout';

const KEY = 'k'.repeat(32);
const link = 'https://bench.example.test/o/abc_DEF-123.sig?x=1&y=2';

describe('outbox secrets: the link is stored sealed and put back only at send time', () => {
  it('stores neither spelling of the link (plain, HTML-escaped) and fills both back exactly', () => {
    const text = `Your page: ${link}\nAgain: ${link}`;
    const html = `<a href="${esc(link)}">${esc(link)}</a>`;
    const [t, h] = [withPlaceholders(text, [link]), withPlaceholders(html, [link])];
    expect(`${t}${h}`).not.toContain('abc_DEF-123');
    expect(fillSecrets(t, [link], false)).toBe(text);
    expect(fillSecrets(h, [link], true)).toBe(html);
  });

  it('a text (no HTML) keeps the placeholder in place of the link and gets the exact link back at send', () => {
    const text = `Shop: your page: ${link}`;
    const stored = core.withPlaceholders(text, [link]);
    expect(stored).toBe('Shop: your page: [[bp-secret-0]]');
    expect(core.fillSecrets(stored, core.openSecrets(KEY, core.sealSecrets(KEY, [link])))).toBe(text);
  });

  it('seals with AES-256-GCM under the server secret: the sealed text holds no link, another key cannot open it, a changed byte is refused', () => {
    const sealed = sealSecrets(KEY, [link]);
    expect(sealed).not.toContain('abc_DEF');
    expect(openSecrets(KEY, sealed)).toEqual([link]);
    expect(() => openSecrets('j'.repeat(32), sealed)).toThrow();
    const parts = sealed.split('.');
    const body = Buffer.from(parts[3], 'base64url');
    body[0] ^= 1;
    expect(() => openSecrets(KEY, [...parts.slice(0, 3), body.toString('base64url')].join('.'))).toThrow();
  });

  it('words the report e-mail by where the job stands: finished only when finished, a decision when items are open', () => {
    expect(reportStage('ready', 0)).toEqual({ kind: 'finished' });
    expect(reportStage('collected', 2)).toEqual({ kind: 'finished' });
    expect(reportStage('ready', 1)).toEqual({ kind: 'decision', openItems: 1 });
    expect(reportStage('waiting_owner', 2)).toEqual({ kind: 'decision', openItems: 2 });
    expect(reportStage('in_work', 0)).toEqual({ kind: 'in_progress' });
    expect(reportStage('cancelled', 1)).toEqual({ kind: 'record' });
  });
});
