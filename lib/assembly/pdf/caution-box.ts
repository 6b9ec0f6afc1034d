// A caution as a boxed row: the signal word in a coloured panel on the left, the message beside it.
// The words mean what ANSI Z535.4 §4.14 says they mean (docs/safety.md §4.1); the panel carries the
// safety alert symbol for the personal-injury words only (Z535.4: never with NOTICE). Our palette
// has one safety orange, so DANGER, WARNING and CAUTION share it and NOTICE is ink blue.
import type { SheetCaution, SignalWord } from "../sheet";
import type { Flow } from "./flow";
import { FONT } from "./fonts";
import { COLOUR, SIZE } from "./look";
import { alertSymbol } from "./marks";
import { STYLE, heightOf, write } from "./text";

const PANEL = 84;
const PAD = 5;

export function signalColour(word: SignalWord): string {
  return word === "NOTICE" ? COLOUR.ink : COLOUR.caution;
}

export function cautionBox(flow: Flow, c: SheetCaution): void {
  const doc = flow.doc;
  const colour = signalColour(c.signal);
  const textW = flow.width - PANEL - 2 * PAD;
  const word = {
    font: c.signal === "NOTICE" ? FONT.sansSemibold : FONT.sansBold,
    size: SIZE.body,
    color: COLOUR.white,
  };
  const h = Math.max(heightOf(doc, c.text, STYLE.body, textW, 1) + 2 * PAD, 22);
  flow.need(h + 4);
  const x = flow.left;
  const y = flow.y;
  doc.save().rect(x, y, PANEL, h).fill(colour).restore();
  const symbol = c.signal === "NOTICE" ? 0 : 11;
  if (symbol) alertSymbol(doc, x + PAD, y + PAD + 0.5, symbol, COLOUR.white, colour);
  write(doc, c.signal, x + PAD + (symbol ? symbol + 4 : 0), y + PAD, word);
  write(doc, c.text, x + PANEL + PAD, y + PAD, STYLE.body, { width: textW, lineGap: 1 });
  doc.save().lineWidth(1.2).strokeColor(colour).rect(x, y, flow.width, h).stroke().restore();
  flow.y += h + 4;
}
