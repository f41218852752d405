/** One server-sent event: its type (`message` when the server named none) and its data text. */
export interface SseMessage {
  event: string;
  data: string;
  id?: string;
}

/**
 * Reads a text/event-stream as it arrives, chunk by chunk: a chunk may end anywhere, even inside
 * a line or between the CR and LF of one line ending.
 *
 * Method: the event-stream interpretation of the WHATWG HTML Living Standard, §9.2.6 "Interpreting
 * an event stream": lines end with CRLF, LF or CR; a line starting with `:` is a comment; a field
 * line is `name: value` (one space after the colon is dropped; a line without a colon is a field
 * with an empty value); `data` lines are joined with LF; a blank line dispatches the event, unless
 * no data was given; an event still open when the stream ends is dropped; `retry` and unknown
 * fields are ignored (the caller decides how to reconnect); an id containing NUL is ignored.
 */
export class SseTextParser {
  private buffer = '';
  private eventType = '';
  private dataLines: string[] = [];
  private lastId: string | undefined;
  private sawFirstChunk = false;
  private afterCr = false;

  /** Adds the next piece of the stream; returns the events it completed, in order. */
  push(chunk: string): SseMessage[] {
    if (!this.sawFirstChunk && chunk.length > 0) {
      this.sawFirstChunk = true;
      // A byte-order mark may open the stream and is not part of the first field name.
      if (chunk.startsWith('\uFEFF')) chunk = chunk.slice(1);
    }
    // A CR ends its line at once (a CR-only stream must not wait for more); an LF right after it,
    // even in the next chunk, belongs to the same line end.
    if (this.afterCr && chunk.startsWith('\n')) chunk = chunk.slice(1);
    this.afterCr = false;
    this.buffer += chunk;
    const messages: SseMessage[] = [];
    let start = 0;
    for (;;) {
      const end = this.buffer.slice(start).search(/[\r\n]/);
      if (end === -1) break;
      const at = start + end;
      const message = this.line(this.buffer.slice(start, at));
      if (message) messages.push(message);
      if (this.buffer[at] === '\r') {
        if (at + 1 === this.buffer.length) this.afterCr = true;
        start = this.buffer[at + 1] === '\n' ? at + 2 : at + 1;
      } else {
        start = at + 1;
      }
    }
    this.buffer = this.buffer.slice(start);
    return messages;
  }

  private line(line: string): SseMessage | null {
    if (line === '') return this.dispatch();
    if (line.startsWith(':')) return null;
    const colon = line.indexOf(':');
    const name = colon === -1 ? line : line.slice(0, colon);
    let value = colon === -1 ? '' : line.slice(colon + 1);
    if (value.startsWith(' ')) value = value.slice(1);
    switch (name) {
      case 'event':
        this.eventType = value;
        break;
      case 'data':
        this.dataLines.push(value);
        break;
      case 'id':
        if (!value.includes('\0')) this.lastId = value;
        break;
    }
    return null;
  }

  private dispatch(): SseMessage | null {
    const type = this.eventType;
    const lines = this.dataLines;
    this.eventType = '';
    this.dataLines = [];
    if (lines.length === 0) return null;
    const message: SseMessage = { event: type || 'message', data: lines.join('\n') };
    if (this.lastId !== undefined) message.id = this.lastId;
    return message;
  }
}
