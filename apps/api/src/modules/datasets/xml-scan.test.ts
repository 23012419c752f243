import { describe, expect, it } from "vitest";
import { XmlScanner, XmlSyntaxError } from "./xml-scan.js";

// The streaming reader against XML 1.0 (W3C, 5th ed.): §2.4 character data and the predefined
// entities, §2.5 comments, §2.6 processing instructions, §2.7 CDATA sections, §3.1 start-tags,
// end-tags and empty-element tags (attribute values may hold ">"), §4.1 character references.
// Each document is also fed split at every position, as inflated chunks arrive, and must give
// the same events.

type Event = string;

function events(chunks: string[]): Event[] {
  const out: Event[] = [];
  let text = "";
  const flush = () => {
    if (text !== "") out.push(`text ${text}`);
    text = "";
  };
  const s = new XmlScanner(
    {
      open: (name, attrs) => {
        flush();
        out.push(`open ${name} ${JSON.stringify(attrs)}`);
      },
      close: (name) => {
        flush();
        out.push(`close ${name}`);
      },
      text: (t) => {
        text += t;
      },
    },
    1024,
  );
  for (const c of chunks) s.write(c);
  s.end();
  flush();
  return out;
}

const DOC =
  `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n` +
  `<x:worksheet xmlns:x="urn:s"><dimension ref="A1:B2"/><sheetData>` +
  `<row r="1" spans="1:2"><c r="A1" t="inlineStr"><is><t xml:space="preserve"> North &amp; South </t></is></c>` +
  `<c r='B1' t="s"><v>0</v></c></row><!-- a comment with <c> inside -->` +
  `<row r="2"><c r="A2" s="1"><v>1.5E-3</v></c><c r="B2" t="str"><f>A2&gt;0</f><v>&#x41;&#66;</v></c></row>` +
  `<row\tr="3"\n><c r="A3" t="inlineStr"><is><t><![CDATA[a <b> & c]]></t></is></c><c r="B3" label="x>y"/></row>` +
  `</sheetData></x:worksheet>`;

describe("the streaming XML reader", () => {
  it("reads elements, attributes, entities, character references, CDATA and comments", () => {
    expect(events([DOC])).toEqual([
      "text \n",
      'open worksheet {"xmlns:x":"urn:s"}',
      'open dimension {"ref":"A1:B2"}',
      "close dimension",
      "open sheetData {}",
      'open row {"r":"1","spans":"1:2"}',
      'open c {"r":"A1","t":"inlineStr"}',
      "open is {}",
      'open t {"xml:space":"preserve"}',
      "text  North & South ",
      "close t",
      "close is",
      "close c",
      'open c {"r":"B1","t":"s"}',
      "open v {}",
      "text 0",
      "close v",
      "close c",
      "close row",
      'open row {"r":"2"}',
      'open c {"r":"A2","s":"1"}',
      "open v {}",
      "text 1.5E-3",
      "close v",
      "close c",
      'open c {"r":"B2","t":"str"}',
      "open f {}",
      "text A2>0",
      "close f",
      "open v {}",
      "text AB",
      "close v",
      "close c",
      "close row",
      'open row {"r":"3"}',
      'open c {"r":"A3","t":"inlineStr"}',
      "open is {}",
      "open t {}",
      "text a <b> & c",
      "close t",
      "close is",
      "close c",
      'open c {"r":"B3","label":"x>y"}',
      "close c",
      "close row",
      "close sheetData",
      "close worksheet",
    ]);
  });

  it("gives the same events however the text is split into chunks", () => {
    const whole = events([DOC]);
    for (let at = 1; at < DOC.length; at++) expect(events([DOC.slice(0, at), DOC.slice(at)])).toEqual(whole);
    const threes: string[] = [];
    for (let at = 0; at < DOC.length; at += 3) threes.push(DOC.slice(at, at + 3));
    expect(events(threes)).toEqual(whole);
  });

  it("refuses a document type declaration, an unfinished tag and a tag longer than the bound", () => {
    expect(() => events(['<?xml version="1.0"?><!DOCTYPE x [<!ENTITY a "b">]><x/>'])).toThrow(XmlSyntaxError);
    expect(() => events(["<row><c r="])).toThrow(XmlSyntaxError);
    expect(() => events([`<c r="${"A".repeat(2000)}`])).toThrow(XmlSyntaxError);
    expect(() => events(["<c r=A1/>"])).toThrow(XmlSyntaxError);
    expect(() => events(["<c <v>"])).toThrow(XmlSyntaxError);
    expect(() => events(["<v>&#x110000;</v>"])).toThrow(XmlSyntaxError);
  });
});
