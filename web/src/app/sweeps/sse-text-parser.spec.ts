import { SseTextParser } from './sse-text-parser';

// Reference: WHATWG HTML Living Standard, §9.2.6 "Interpreting an event stream" — the worked
// examples below are the standard's own, with the results it states.

function parseAll(text: string, chunkSize = text.length) {
  const parser = new SseTextParser();
  const out = [];
  for (let i = 0; i < text.length; i += chunkSize)
    out.push(...parser.push(text.slice(i, i + chunkSize)));
  return out;
}

describe('SseTextParser', () => {
  it('joins data lines with LF (the standard\'s "YHOO +2 10" example)', () => {
    expect(parseAll('data: YHOO\ndata: +2\ndata: 10\n\n')).toEqual([
      { event: 'message', data: 'YHOO\n+2\n10' },
    ]);
  });

  it("keeps the last id and drops one space after the colon (the standard's example)", () => {
    const text =
      ': test stream\n\ndata: first event\nid: 1\n\n' +
      'data:second event\nid\n\ndata:  third event\n\n';
    expect(parseAll(text)).toEqual([
      { event: 'message', data: 'first event', id: '1' },
      // A bare `id` line resets the id to empty.
      { event: 'message', data: 'second event', id: '' },
      { event: 'message', data: ' third event', id: '' },
    ]);
  });

  it('dispatches nothing for a block without data, and drops an event open at the end', () => {
    // The standard's example: "data\n\ndata\ndata\n\ndata:" gives "" then "\n"; the last is open.
    expect(parseAll('data\n\ndata\ndata\n\ndata:')).toEqual([
      { event: 'message', data: '' },
      { event: 'message', data: '\n' },
    ]);
    expect(parseAll('event: progress\n\n')).toEqual([]);
  });

  it('reads named events the sweep stream sends', () => {
    const text =
      'event: progress\ndata: {"pointsDone":10}\n\n' +
      'event: end\ndata: {"status":"succeeded"}\n\n';
    expect(parseAll(text)).toEqual([
      { event: 'progress', data: '{"pointsDone":10}' },
      { event: 'end', data: '{"status":"succeeded"}' },
    ]);
  });

  it('gives the same events whatever the chunk boundaries and line endings', () => {
    const lf = 'event: progress\ndata: {"a":1}\n\n: keep-alive\n\nevent: end\ndata: {"b":2}\n\n';
    const expected = parseAll(lf);
    expect(expected).toHaveLength(2);
    for (const ending of ['\n', '\r\n', '\r']) {
      const text = lf.replace(/\n/g, ending);
      for (const size of [1, 2, 3, 7, text.length]) {
        expect(parseAll(text, size), `ending ${JSON.stringify(ending)}, chunks of ${size}`).toEqual(
          expected,
        );
      }
    }
  });

  it('takes a CRLF split across chunks as one line end, not a CR and a blank line', () => {
    const parser = new SseTextParser();
    expect(parser.push('data: x\r')).toEqual([]);
    // Read as CR + blank line, the LF would dispatch "x" alone and "y" as a second event.
    expect(parser.push('\ndata: y\r\n')).toEqual([]);
    expect(parser.push('\r\n')).toEqual([{ event: 'message', data: 'x\ny' }]);
  });

  it('dispatches a CR-only stream at its last CR, without waiting for more', () => {
    const parser = new SseTextParser();
    expect(parser.push('event: end\rdata: {}\r\r')).toEqual([{ event: 'end', data: '{}' }]);
  });

  it('ignores a leading byte-order mark, comments, retry and unknown fields', () => {
    expect(parseAll('\uFEFFretry: 1000\nfoo: bar\n: note\ndata: ok\n\n')).toEqual([
      { event: 'message', data: 'ok' },
    ]);
  });

  it('takes a line without a colon as a field with an empty value', () => {
    expect(parseAll('event\ndata\n\n')).toEqual([{ event: 'message', data: '' }]);
  });
});
