/**
 * A small streaming reader for the XML that spreadsheet parts are written in (ECMA-376 uses a
 * plain subset of XML 1.0: elements, attributes, character references and the five predefined
 * entities, CDATA, comments and processing instructions). Written here because a general XML
 * parser reads a large sheet several times slower, and a sheet's cells must be counted at the
 * speed they arrive. A document type declaration is refused: spreadsheet parts never carry one,
 * and refusing it rules out entity expansion. Text is handed on in pieces as it arrives, so no
 * text is held whole; only an unfinished tag is carried between chunks, and that is bounded.
 */
export interface XmlHandlers {
  open?: (name: string, attrs: Record<string, string>) => void;
  close?: (name: string) => void;
  text?: (text: string) => void;
}

export class XmlSyntaxError extends Error {}

const NO_ATTRIBUTES: Record<string, string> = Object.freeze({}) as Record<string, string>;

const ENTITY = /&(#x[0-9a-fA-F]{1,6}|#[0-9]{1,7}|amp|lt|gt|quot|apos);/g;
const NAMED: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'" };

function decode(s: string): string {
  if (s.indexOf("&") < 0) return s;
  return s.replace(ENTITY, (_m, e: string) => {
    if (e.charCodeAt(0) !== 35) return NAMED[e]!;
    const cp = e[1] === "x" ? parseInt(e.slice(2), 16) : parseInt(e.slice(1), 10);
    if (cp > 0x10ffff) throw new XmlSyntaxError("character reference out of range");
    return String.fromCodePoint(cp);
  });
}

/** A prefix "x:" of a qualified name is dropped: parts use one namespace per element name. */
function localName(name: string): string {
  const i = name.indexOf(":");
  return i < 0 ? name : name.slice(i + 1);
}

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13;
}

export class XmlScanner {
  private carry = "";

  constructor(
    private readonly h: XmlHandlers,
    /** Longest unfinished construct (a tag, comment or entity) carried to the next chunk. */
    private readonly maxCarry: number,
  ) {}

  write(chunk: string): void {
    // join, not "+": it makes one flat string, and reading characters from a concatenated (cons)
    // string is several times slower in V8.
    const s = this.carry === "" ? chunk : [this.carry, chunk].join("");
    this.carry = "";
    const n = s.length;
    const h = this.h;
    let i = 0;
    while (i < n) {
      const lt = s.indexOf("<", i);
      if (lt < 0) {
        // Keep a possibly unfinished entity ("&am") for the next chunk.
        const amp = s.lastIndexOf("&");
        const cut = amp >= i && s.indexOf(";", amp) < 0 && n - amp <= 12 ? amp : n;
        if (cut > i) this.text(s.slice(i, cut));
        this.keep(s.slice(cut));
        return;
      }
      if (lt > i) this.text(s.slice(i, lt));
      if (lt + 1 >= n) return this.keep(s.slice(lt));
      // One look at the character after "<" decides the construct (most are plain tags).
      const next = s.charCodeAt(lt + 1);
      let end: number;
      if (next === 33 /* ! */) {
        if (s.startsWith("<!--", lt)) {
          end = s.indexOf("-->", lt + 4);
          if (end < 0) return this.keep(s.slice(lt));
          i = end + 3;
        } else if (s.startsWith("<![CDATA[", lt)) {
          end = s.indexOf("]]>", lt + 9);
          if (end < 0) return this.keep(s.slice(lt));
          if (end > lt + 9) h.text?.(s.slice(lt + 9, end));
          i = end + 3;
        } else {
          if (n - lt < 9) return this.keep(s.slice(lt));
          throw new XmlSyntaxError("document type declarations are not read");
        }
      } else if (next === 63 /* ? */) {
        end = s.indexOf("?>", lt + 2);
        if (end < 0) return this.keep(s.slice(lt));
        i = end + 2;
      } else {
        end = tagEnd(s, lt + 1);
        if (end < 0) return this.keep(s.slice(lt));
        if (next === 47 /* / */) this.closeTag(s, lt + 2, end);
        else this.openTag(s, lt + 1, end);
        i = end + 1;
      }
    }
  }

  /** Call after the last chunk: anything left over is an unfinished document. */
  end(): void {
    if (this.carry.trim() !== "") throw new XmlSyntaxError("the part ends inside a tag");
  }

  private keep(rest: string): void {
    if (rest.length > this.maxCarry) throw new XmlSyntaxError("a tag or comment longer than the bound");
    this.carry = rest;
  }

  private text(raw: string): void {
    this.h.text?.(decode(raw));
  }

  private closeTag(s: string, from: number, end: number): void {
    let to = end;
    while (to > from && isSpace(s.charCodeAt(to - 1))) to--;
    this.h.close?.(localName(s.slice(from, to)));
  }

  /** A start or empty-element tag in s[from, end): its name, then its attributes, read in place. */
  private openTag(s: string, from: number, end: number): void {
    const selfClosing = s.charCodeAt(end - 1) === 47;
    const stop = selfClosing ? end - 1 : end;
    let k = from;
    while (k < stop && !isSpace(s.charCodeAt(k))) k++;
    const name = localName(s.slice(from, k));
    if (name === "") throw new XmlSyntaxError("a tag without a name");
    // Most tags in a sheet (<v>, <row>, <is>, <t>) carry no attributes: no object for them.
    let attrs = NO_ATTRIBUTES;
    for (;;) {
      while (k < stop && isSpace(s.charCodeAt(k))) k++;
      if (k >= stop) break;
      const eq = s.indexOf("=", k);
      if (eq < 0 || eq >= stop) throw new XmlSyntaxError("an attribute without a value");
      let nameEnd = eq;
      while (nameEnd > k && isSpace(s.charCodeAt(nameEnd - 1))) nameEnd--;
      const attr = s.slice(k, nameEnd);
      k = eq + 1;
      while (k < stop && isSpace(s.charCodeAt(k))) k++;
      const q = s.charCodeAt(k);
      if (q !== 34 && q !== 39) throw new XmlSyntaxError("an unquoted attribute value");
      const close = s.indexOf(q === 34 ? '"' : "'", k + 1);
      if (close < 0 || close >= stop) throw new XmlSyntaxError("an unfinished attribute value");
      if (attrs === NO_ATTRIBUTES) attrs = {};
      attrs[attr] = decode(s.slice(k + 1, close));
      k = close + 1;
    }
    this.h.open?.(name, attrs);
    if (selfClosing) this.h.close?.(name);
  }
}

/** Index of the ">" that ends the tag starting at `from`, skipping quoted attribute values. */
function tagEnd(s: string, from: number): number {
  let quote = 0;
  for (let j = from; j < s.length; j++) {
    const c = s.charCodeAt(j);
    if (quote) {
      if (c === quote) quote = 0;
    } else if (c === 62) return j;
    else if (c === 34 || c === 39) quote = c;
    else if (c === 60) throw new XmlSyntaxError("'<' inside a tag");
  }
  return -1;
}
