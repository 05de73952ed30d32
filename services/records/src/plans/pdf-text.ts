import zlib from 'node:zlib';

/**
 * The text of a PDF written by pdfkit, for tests: inflates Flate streams, decodes hex strings
 * through each font's ToUnicode map (embedded fonts) or as single bytes (built-in fonts), and
 * returns one line per text object. Not a general PDF reader.
 */
export function pdfText(pdf: Buffer): string {
  const source = pdf.toString('latin1');
  const objects = new Map<string, { dict: string; stream: string | null }>();
  for (const m of source.matchAll(/(\d+) 0 obj\s*([\s\S]*?)endobj/g)) {
    const body = m[2]!;
    const at = body.indexOf('stream\n');
    if (at < 0) {
      objects.set(m[1]!, { dict: body, stream: null });
      continue;
    }
    const dict = body.slice(0, at);
    const raw = Buffer.from(body.slice(at + 'stream\n'.length, body.lastIndexOf('\nendstream')), 'latin1');
    const data = /\/FlateDecode/.test(dict) ? zlib.inflateSync(raw) : raw;
    objects.set(m[1]!, { dict, stream: data.toString('latin1') });
  }

  // Font resource name (F1, F2, …) to its code→text map; null for single-byte built-in fonts.
  const fonts = new Map<string, Map<number, string> | null>();
  for (const m of source.matchAll(/\/(F\d+) (\d+) 0 R/g)) {
    const font = objects.get(m[2]!);
    const toUnicode = font?.dict.match(/\/ToUnicode (\d+) 0 R/);
    const cmap = toUnicode ? objects.get(toUnicode[1]!)?.stream : null;
    fonts.set(m[1]!, cmap ? parseCMap(cmap) : null);
  }

  const lines: string[] = [];
  for (const { dict, stream } of objects.values()) {
    if (!stream || /\/Type|\/Subtype|\/Length1/.test(dict) || !/\bBT\b/.test(stream)) continue;
    for (const block of stream.matchAll(/\bBT\b([\s\S]*?)\bET\b/g)) {
      let font: Map<number, string> | null = null;
      let line = '';
      for (const op of block[1]!.matchAll(/\/(F\d+) [\d.]+ Tf|\[((?:[^\]])*)\]\s*TJ|<([0-9a-fA-F]*)>\s*Tj/g)) {
        if (op[1]) font = fonts.get(op[1]) ?? null;
        const hexes = op[2] !== undefined ? [...op[2].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]!) : op[3] !== undefined ? [op[3]] : [];
        for (const hex of hexes) line += decodeHex(hex, font);
      }
      if (line) lines.push(line);
    }
  }
  return lines.join('\n');
}

function decodeHex(hex: string, cmap: Map<number, string> | null): string {
  if (!cmap) return Buffer.from(hex, 'hex').toString('latin1');
  let text = '';
  for (let i = 0; i + 4 <= hex.length; i += 4) text += cmap.get(parseInt(hex.slice(i, i + 4), 16)) ?? '\uFFFD';
  return text;
}

const utf16 = (spaced: string) => {
  // A ligature maps to several code units, written with spaces: <0066 0069> is "fi".
  const hex = spaced.replace(/\s+/g, '');
  const units: number[] = [];
  for (let i = 0; i + 4 <= hex.length; i += 4) units.push(parseInt(hex.slice(i, i + 4), 16));
  return String.fromCharCode(...units);
};

function parseCMap(cmap: string): Map<number, string> {
  const map = new Map<number, string>();
  for (const section of cmap.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const m of section[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(\[[^\]]*\]|<[0-9a-fA-F\s]+>)/g)) {
      const from = parseInt(m[1]!, 16);
      const to = parseInt(m[2]!, 16);
      if (m[3]!.startsWith('[')) {
        [...m[3]!.matchAll(/<([0-9a-fA-F\s]+)>/g)].forEach((h, i) => map.set(from + i, utf16(h[1]!)));
      } else {
        const first = parseInt(m[3]!.slice(1, -1), 16);
        for (let c = from; c <= to; c++) map.set(c, String.fromCharCode(first + c - from));
      }
    }
  }
  for (const section of cmap.matchAll(/beginbfchar([\s\S]*?)endbfchar/g)) {
    for (const m of section[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F\s]+)>/g)) map.set(parseInt(m[1]!, 16), utf16(m[2]!));
  }
  return map;
}
