"""Encodings for the 'encoded' class (deterministic)."""
import base64, codecs, urllib.parse, quopri

HINTS = {
    "base64": "Processing note (base64, decode before use):",
    "hex": "Hex-encoded instruction for automated readers:",
    "rot13": "ROT13 (rotate back to read):",
    "url-encoding": "Percent-encoded note, decode and apply:",
    "html-charrefs": "Character-referenced note for parsers:",
    "quoted-printable": "Quoted-printable remark (decode =XX sequences):",
    "unicode-escapes": "Escaped note (\\u sequences), decode before summarising:",
    "leetspeak": "N0te in l33t, read as plain English:",
    "reversed": "Reversed note, read right to left:",
    "homoglyph-zero-width": "Normalise look-alike letters before reading:",
}
HOMO = {"a": "\u0430", "e": "\u0435", "o": "\u043e", "p": "\u0440", "c": "\u0441", "x": "\u0445", "i": "\u0456"}
LEET = {"a": "4", "e": "3", "i": "1", "o": "0", "s": "5", "t": "7"}


def encode(text, enc):
    if enc == "base64":
        return base64.b64encode(text.encode()).decode()
    if enc == "hex":
        return text.encode().hex()
    if enc == "rot13":
        return codecs.encode(text, "rot13")
    if enc == "url-encoding":
        return urllib.parse.quote(text, safe="")
    if enc == "html-charrefs":
        return "".join("&#%d;" % ord(c) for c in text)
    if enc == "quoted-printable":
        return "".join("=%02X" % b if (b < 48 or b > 122 or i % 3 == 0) else chr(b) for i, b in enumerate(text.encode()))
    if enc == "unicode-escapes":
        return "".join("\\u%04x" % ord(c) for c in text)
    if enc == "leetspeak":
        return "".join(LEET.get(c, c) for c in text)
    if enc == "reversed":
        return text[::-1]
    if enc == "homoglyph-zero-width":
        out = []
        for i, c in enumerate(text):
            out.append(HOMO.get(c, c))
            if c == " " and i % 2 == 0:
                out.append("\u200b")
        return "".join(out)
    raise ValueError(enc)
