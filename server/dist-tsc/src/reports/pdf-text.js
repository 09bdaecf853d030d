// The PDF's built-in fonts (Helvetica) cover the Windows-1252 characters only; anything else would
// print as a wrong glyph, so it is folded to its base letter (ā → a) or a question mark.
const EXTRA = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';
const printable = (c) => {
    const code = c.codePointAt(0);
    return (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff) || code === 0x0a || EXTRA.includes(c);
};
export function pdfSafe(s) {
    let out = '';
    for (const c of s) {
        if (printable(c)) {
            out += c;
            continue;
        }
        const base = c.normalize('NFD').replace(/\p{M}/gu, '');
        out += [...base].every(printable) && base ? base : '?';
    }
    return out;
}
//# sourceMappingURL=pdf-text.js.map