import { mailParts } from './mail-text';

describe('mailParts', () => {
  it('finds the links in a mail’s text, without trailing punctuation', () => {
    expect(mailParts('Accept it at http://127.0.0.1:4300/accept-invitation?token=abc.def. It expires in 7 days.')).toEqual([
      { text: 'Accept it at ', href: null },
      { text: 'http://127.0.0.1:4300/accept-invitation?token=abc.def', href: 'http://127.0.0.1:4300/accept-invitation?token=abc.def' },
      { text: '. It expires in 7 days.', href: null },
    ]);
  });

  it('keeps text without links as one piece, and never makes other schemes links', () => {
    expect(mailParts('javascript:alert(1) and mailto:x@y')).toEqual([{ text: 'javascript:alert(1) and mailto:x@y', href: null }]);
  });
});
