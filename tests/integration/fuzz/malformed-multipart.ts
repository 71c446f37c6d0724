// Multipart bodies as a broken or hostile client sends them (RFC 7578, multipart/form-data; RFC 2046 §5.1.1 for
// boundaries): each must be refused with a 4xx, never reach a handler half-read.
const B = 'walkboundary18';
const TYPE = `multipart/form-data; boundary=${B}`;
// A real PNG signature and header start: a parser reading the file's type sees an image.
const PNG_START = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');

function part(headers: string | Buffer, content: string | Buffer): Buffer {
  return Buffer.concat([Buffer.from(`--${B}\r\n`), Buffer.from(headers), Buffer.from('\r\n\r\n'), Buffer.from(content), Buffer.from('\r\n')]);
}
const end = Buffer.from(`--${B}--\r\n`);
const kind = part('Content-Disposition: form-data; name="kind"', 'hair_now');
/** A file part; the name goes in as bytes, so it can hold what UTF-8 does not allow. */
const file = (filename: string | Buffer) =>
  part(
    Buffer.concat([
      Buffer.from('Content-Disposition: form-data; name="photos"; filename="'),
      Buffer.from(filename),
      Buffer.from('"\r\nContent-Type: image/png'),
    ]),
    PNG_START,
  );

export function malformedMultipart(): { label: string; contentType: string; body: Buffer }[] {
  const whole = Buffer.concat([kind, file('hair.png'), end]);
  return [
    { label: 'no boundary parameter', contentType: 'multipart/form-data', body: whole },
    { label: 'truncated in the middle of a file', contentType: TYPE, body: whole.subarray(0, whole.length - 20) },
    { label: 'no closing boundary', contentType: TYPE, body: Buffer.concat([kind, file('hair.png')]) },
    { label: 'a part header without a colon', contentType: TYPE, body: Buffer.concat([part('Content-Disposition form-data name=photos', 'x'), end]) },
    { label: 'a part without Content-Disposition', contentType: TYPE, body: Buffer.concat([part('Content-Type: image/png', PNG_START), end]) },
    { label: 'NUL in the file name', contentType: TYPE, body: Buffer.concat([kind, file('hair\u0000.png'), end]) },
    {
      label: 'invalid UTF-8 in the file name',
      contentType: TYPE,
      body: Buffer.concat([kind, file(Buffer.from([0x68, 0xed, 0xa0, 0x80, 0x2e, 0x70, 0x6e, 0x67])), end]),
    },
    {
      label: 'NUL in a text field',
      contentType: TYPE,
      body: Buffer.concat([part('Content-Disposition: form-data; name="kind"', 'hair\u0000now'), file('a.png'), end]),
    },
    {
      label: 'an unknown text field',
      contentType: TYPE,
      body: Buffer.concat([kind, part('Content-Disposition: form-data; name="isAdmin"', 'true'), file('a.png'), end]),
    },
    {
      label: '10,000 parts',
      contentType: TYPE,
      body: Buffer.concat([...Array.from({ length: 10_000 }, () => part('Content-Disposition: form-data; name="k"', 'v')), end]),
    },
    {
      label: 'a header line of 100 kB',
      contentType: TYPE,
      body: Buffer.concat([part(`Content-Disposition: form-data; name="${'n'.repeat(100_000)}"`, 'v'), end]),
    },
    { label: 'JSON sent as multipart', contentType: TYPE, body: Buffer.from('{"kind":"hair_now"}') },
    { label: 'empty body', contentType: TYPE, body: Buffer.alloc(0) },
  ];
}
