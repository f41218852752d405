import { linkifyText } from './linkify-text';

describe('linkifyText', () => {
  it('finds links and leaves the sentence punctuation outside them', () => {
    const text =
      'Marta invited you.\nOpen http://127.0.0.1:4300/invitations/Zq9-x_1 to accept. ' +
      'Or (https://a.example/b).';
    expect(linkifyText(text)).toEqual([
      { kind: 'text', text: 'Marta invited you.\nOpen ' },
      {
        kind: 'link',
        text: 'http://127.0.0.1:4300/invitations/Zq9-x_1',
        href: 'http://127.0.0.1:4300/invitations/Zq9-x_1',
      },
      { kind: 'text', text: ' to accept. Or (' },
      { kind: 'link', text: 'https://a.example/b', href: 'https://a.example/b' },
      { kind: 'text', text: ').' },
    ]);
  });

  it('returns plain text as one segment, and never a javascript: link', () => {
    expect(linkifyText('javascript:alert(1) is not a link')).toEqual([
      { kind: 'text', text: 'javascript:alert(1) is not a link' },
    ]);
    expect(linkifyText('')).toEqual([]);
  });
});
