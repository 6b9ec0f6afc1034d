// The markup of an SVG file, read by saxes as strict XML (no DOM: it runs in a Web Worker and in
// Node, and never renders, evaluates, fetches or follows anything). A DOCTYPE is refused, and with
// it every entity declaration (the "billion laughs" expansion and XML external entities live
// there); only XML's five predefined entities and character references are decoded (XML 1.0 §4.6).
// saxes's own error texts become sentences that name the line.
//
// Kept here, because saxes has no way to do it: the content of <script>, <style> and
// <foreignObject> is skipped unread as raw text (HTML inside them need not be XML), and reading
// stops once the root element closes. For both, the file is handed to saxes in pieces that each
// end at a ">", so after the piece that opens such an element we jump to its closing tag.

import { SaxesParser, type SaxesTagPlain } from "saxes";
import { fail, lineOf } from "./common";

interface MarkupHandlers {
  /** An element's start tag; return "raw" to skip its content unread. */
  open(tag: SaxesTagPlain, line: number): "raw" | void;
  close(): void;
  instruction(target: string, line: number): void;
}

/** Line numbers of offsets, counted forward from the last one asked for (reading only moves forward). */
class LineCounter {
  private mark = 0;
  private count = 1;
  constructor(private readonly text: string) {}
  at(offset: number): number {
    if (offset < this.mark) return lineOf(this.text, offset);
    const end = Math.min(offset, this.text.length);
    for (let k = this.mark; k < end; k++) if (this.text.charCodeAt(k) === 10) this.count++;
    this.mark = Math.max(this.mark, end);
    return this.count;
  }
}

// An "&" that starts no entity or character reference. saxes reads such a one on to the next ";",
// however far, so it is looked for here to name the right line.
const BARE_AMPERSAND = /&(?![\p{L}_:][\p{L}\p{N}_:.\-]*;|#[0-9]+;|#x[0-9A-Fa-f]+;)/gu;
const BARE_AMPERSAND_REFUSED = 'a bare "&" (write &amp;).';

const DOCTYPE_REFUSED =
  "the file has a DOCTYPE declaration, which is refused: DOCTYPEs can declare entities that expand without bound or read other files. Save the SVG without it.";

/** saxes's message (without its "line:column: " prefix) as our sentence, or null to let it pass. */
function describeXmlError(message: string, line: number, text: string, markup: number, offset: number): string | null {
  const tag = /^<\/?([^\s/>]+)/.exec(text.slice(markup, markup + 200))?.[1] ?? "?";
  const at = `line ${line}`;
  if (message.startsWith("text data outside of root node")) return null; // text before the root draws nothing
  if (message.startsWith("inappropriately located doctype")) return `${at}: ${DOCTYPE_REFUSED}`;
  if (message.startsWith("incorrect syntax"))
    return text.startsWith("<!ENTITY", markup)
      ? `${at}: the file declares an ENTITY, which is refused (entities can expand without bound or read other files).`
      : `${at}: an unexpected "<!" declaration.`;
  if (message.startsWith("undefined entity")) {
    const amp = text.lastIndexOf("&", offset - 1);
    const name = text.slice(amp + 1, offset - 1).slice(0, 40);
    return `${at}: the entity reference &${name}; is not one of XML's predefined entities (custom entities need a DOCTYPE, which is refused).`;
  }
  if (message.startsWith("malformed character entity"))
    return `${at}: a character reference that is not a valid character.`;
  const dup = /^duplicate attribute: (.*)\.$/.exec(message);
  if (dup) return `${at}: <${tag}> gives the attribute ${dup[1]} twice.`;
  if (message.startsWith("attribute without value")) return `${at}: <${tag}> has an attribute with no value.`;
  if (message.startsWith("unquoted attribute value"))
    return `${at}: <${tag}> has an attribute value that is not quoted.`;
  if (message.startsWith("no whitespace between attributes"))
    return `${at}: <${tag}> needs a space between attributes.`;
  if (message.startsWith("disallowed character in attribute name"))
    return `${at}: <${tag}> has an attribute that cannot be read.`;
  if (message.startsWith("forward-slash in opening tag")) return `${at}: in <${tag}>, "/" must be followed by ">".`;
  if (message.startsWith("disallowed character in tag name"))
    return `${at}: a "<" that does not start an element (write &lt;).`;
  if (message.startsWith("disallowed character in closing tag") || message.startsWith("weird empty close tag"))
    return `${at}: a closing tag that cannot be read.`;
  const unmatched = /^unmatched closing tag: (.*)\.$/.exec(message);
  if (unmatched) return `${at}: </${unmatched[1]}> does not match any open element.`;
  if (message.startsWith("malformed comment"))
    return `${at}: a comment holds "--", which XML does not allow inside a comment.`;
  if (message.includes('"]]>"'))
    return `${at}: the text holds "]]>", which XML allows only at the end of a CDATA section.`;
  if (message.startsWith("disallowed character"))
    return `${at}: a character that XML does not allow (such as a form feed or a control character).`;
  if (
    /XML declaration|processing instruction|version|encoding|standalone|expected|value|whitespace required/i.test(
      message,
    )
  )
    return `${at}: the XML declaration or a processing instruction cannot be read.`;
  return `${at}: the markup is not well-formed XML here; save the drawing again as plain SVG.`;
}

/** Reads the markup of text, calling h for elements and instructions, until the root closes. */
export function walkMarkup(text: string, h: MarkupHandlers): void {
  const n = text.length;
  const lines = new LineCounter(text);
  const open: Array<{ name: string; line: number }> = [];
  const parser = new SaxesParser({ position: true }); // no xmlns: names as written (xlink:href)
  // Leading whitespace is dropped (an XML declaration must come first); skipped counts the
  // characters never handed to saxes, so parser.position + skipped is an offset in text.
  let fed = Math.max(0, text.indexOf("<"));
  let skipped = fed;
  let markupEnd = fed; // just past the last complete piece of markup
  let completed = false;
  let raw: { name: string; line: number } | null = null;
  let rootClosed = false;
  const markupStart = () => {
    const s = text.indexOf("<", markupEnd);
    return s < 0 ? n : s;
  };
  const bareAmpersand = (): number => {
    BARE_AMPERSAND.lastIndex = markupEnd;
    return BARE_AMPERSAND.exec(text)?.index ?? -1;
  };
  const done = () => {
    completed = true;
  };

  parser.on("xmldecl", done);
  parser.on("comment", done);
  parser.on("cdata", done);
  parser.on("doctype", () => fail(`line ${lines.at(markupStart())}: ${DOCTYPE_REFUSED}`));
  parser.on("processinginstruction", (pi) => {
    done();
    h.instruction(pi.target, lines.at(markupStart()));
  });
  parser.on("opentag", (tag) => {
    done();
    const line = lines.at(markupStart());
    open.push({ name: tag.name, line });
    if (h.open(tag as SaxesTagPlain, line) === "raw" && !tag.isSelfClosing) raw = { name: tag.name, line };
  });
  parser.on("closetag", (tag) => {
    done();
    const top = open.pop();
    if (!tag.isSelfClosing) {
      const start = markupStart();
      const written = /^<\/([^\s>]*)/.exec(text.slice(start, start + 200))?.[1] ?? "";
      if (!top || top.name !== written)
        fail(
          `line ${lines.at(start)}: </${written}> does not match ${top ? `<${top.name}> opened on line ${top.line}` : "any open element"}.`,
        );
    }
    h.close();
    if (open.length === 0) rootClosed = true;
  });
  parser.on("error", (err) => {
    const offset = parser.position + skipped;
    const message = err.message.replace(/^\d+:\d+: /, "");
    if (message.startsWith("disallowed character in entity name") || message.startsWith("empty entity name")) {
      const amp = bareAmpersand();
      fail(`line ${lines.at(amp >= 0 ? amp : offset)}: ${BARE_AMPERSAND_REFUSED}`);
    }
    const why = describeXmlError(message, lines.at(offset), text, markupStart(), offset);
    if (why) fail(why);
  });

  while (fed < n && !rootClosed) {
    const gt = text.indexOf(">", fed);
    const end = gt < 0 ? n : gt + 1;
    parser.write(text.slice(fed, end));
    fed = end;
    if (completed) markupEnd = fed;
    completed = false;
    if (raw && !rootClosed) {
      const { name, line } = raw as { name: string; line: number };
      const close = new RegExp(`</${name}[ \\t\\r\\n]*>`, "g");
      close.lastIndex = fed;
      const m = close.exec(text);
      if (!m) fail(`line ${line}: the <${name}> element is never closed.`);
      skipped += m!.index - fed;
      fed = markupEnd = m!.index;
      raw = null;
    }
  }
  if (!rootClosed && open.length) {
    const amp = bareAmpersand();
    if (amp >= 0) fail(`line ${lines.at(amp)}: ${BARE_AMPERSAND_REFUSED}`);
    const top = open[open.length - 1];
    fail(`The file ends before <${top.name}> (opened on line ${top.line}) is closed; it may be cut short.`);
  }
}
