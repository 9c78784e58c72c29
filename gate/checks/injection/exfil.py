"""Exfiltration: links and images whose address is built to carry data out.

A model that writes a Markdown image ``![](https://collector.example/?q=...)`` makes the
reader's client fetch it, so whatever the model put in the address leaves the
conversation. A planted instruction therefore tends to show an address with a
*placeholder* for the data (``{conversation}``, ``[SECRET]``, ``<user_email>``,
``$HISTORY``, ``%7Bdata%7D``) or a query parameter named for it (``?chat_history=``).

Placeholders for ordinary path parameters (``/orders/{order_id}``) are what API
documentation looks like and are not counted: the placeholder or parameter must name
conversation content, secrets or personal data. Images weigh more than links, because a
client fetches them without a click. Data URIs are never addresses.
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from urllib.parse import parse_qsl, unquote, urlsplit

MAX_URLS = 400
MAX_URL = 4096

_MD_LINK = re.compile(r"(!?)\[([^\]\[\n]{0,300})\]\(\s*<?"
                      r"((?:[^)\s>\[]|\[[^\]\n]{0,60}\]){1,4096})>?(?:\s+\"[^\"\n]{0,200}\")?\s*\)")
_HTML_URL = re.compile(r"<(img|a|iframe|source|embed|object|form|link|script)\b[^>]{0,800}?"
                       r"\b(?:src|href|data|action)\s*=\s*[\"']?([^\"'\s>]{1,4096})", re.I)
_BARE_URL = re.compile(r"https?://[^\s<>\"')\]]{1,4096}")
# A mail address with a prefilled subject or body; "<...>" placeholders are part of it.
_MAILTO = re.compile(r"mailto:[^\s<>\"')\]?]{1,200}\?(?:[^\s<>\"')\]]|<[^<>\n]{1,80}>)"
                     r"{1,2000}", re.I)
_PLACEHOLDER = re.compile(r"\{\{?\s*([A-Za-z_][\w .-]{0,40}?)\s*\}\}?|"
                          r"\[([A-Za-z_][A-Za-z0-9_ ]{1,40})\]|"
                          r"<([A-Za-z_][A-Za-z0-9_ ]{1,40})>|\$\{?([A-Za-z_][A-Za-z0-9_]{1,40})\}?|"
                          r"%7[bB]([\w%.-]{1,60}?)%7[dD]|(X{4,})|"
                          r"%([A-Za-z][A-Za-z_]{2,40})%|"
                          r"(?<==)((?:[A-Z][A-Z0-9]*_)*[A-Z]{4,}(?:_[A-Z0-9]+)*)(?=[&#;]|$)")
# A placeholder written in capitals or between percent signs ("?q=USER_QUESTION",
# "%HISTORY%") is how API pages show a credential to fill in ("?key=YOUR_API_KEY"): in that
# form only names of conversation content and personal data count, never credentials.
_CAPITALS = re.compile(r"^(?:%[A-Za-z_]+%|[A-Z0-9_]+)$")
CREDENTIAL = re.compile(r"key|token|secret|passw|credential|creds|session|cookie|auth|"
                        r"signature|sig$|^id$|_id$", re.I)
CAPITAL_WEAK = re.compile(r"e_?mail|phone|personal|pii|ssn|user|address|child|parent|name",
                          re.I)
# Names of placeholders or parameters that stand for conversation content or secrets
# (strong), or for personal data a template may legitimately fill (weak).
STRONG_NAME = re.compile(
    r"conversation|convo|chat|histor|messages|transcript|prompt|instruction|memory|secret|"
    r"passw|passwd|credential|creds|exfil|leak|dump|stolen|summary|context|answer|response|"
    r"reply|question|api_?key|apikey|last[_ ]?(?:user[_ ]?)?message|user[_ ]?message|"
    r"user[_ ]?input", re.I)
WEAK_NAME = re.compile(
    r"message|token|session|cookie|e_?mail|user|personal|pii|ssn|phone|address|output|query|"
    r"payload|data|info|details|content|b64|base64|name|input", re.I)
# Placeholders naming an identifier ({user_id}, {order_no}) are how API paths look.
IDENTIFIER = re.compile(r"(?:^|[_\-.])(?:id|ids|uuid|guid|slug|num|number|no|page|version|"
                        r"index|code|ref)$|^id[_\-]", re.I)
STRONG_PARAM = re.compile(
    r"^(?:conversation|convo|chat|chat_?history|history|chatlog|transcript|prompt|"
    r"system_?prompt|secret|secrets|api_?key|apikey|password|passwd|credentials|creds|memory|"
    r"exfil|leak|dump|stolen|user_?data|userdata|pii|messages|user_?messages)$", re.I)


# An address whose last query parameter is left empty ("...?note=", "...&u=") is a slot:
# it is for the model when the words around it ask for the user's data to be appended, or
# when the address itself names the AI reader as its referrer ("?ref=assistant&u=").
EMPTY_SLOT = re.compile(r"[?&][\w.\-]{1,30}=$")
READER_REF = re.compile(r"[?&][\w.\-]{1,30}=(?:assistant|ai|llm|bot|agent|model|chatbot|"
                        r"copilot|gpt)(?:&|$)", re.I)
SLOT_CONTEXT = 250
APPEND_CUE = re.compile(
    r"\b(?:append|add|attach|fill(?:ing)?\s+in|include|insert|put|place|paste|enter|"
    r"followed\s+by|after\s+the|"
    r"at\s+the\s+end|acrescent|inclua|adicion|anad|agreg|incluy|ajout|inclu|hang|fug|"
    r"aggiung|includ|voeg|dodaj|lagg\w*\s+till|dobav|pripis|vstav|ekle|tambahkan|"
    r"sertakan)\w*", re.I)
DATA_CUE = re.compile(
    r"\b(?:user'?s?|users|conversation|chat|question|e-?mail|full\s+name|name|history|"
    r"what\s+the\s+user|told\s+you|summary|phone|address|usuari|usuári|conversa|"
    r"historic|histórico|pergunta|pregunta|utilisateur|conversation|nutzer|benutzer|"
    r"unterhaltung|verlauf|utente|conversazione|gebruiker|gesprek|uzytkownik|użytkownik|"
    r"rozmow|anvandar|användar|konversation|пользовател|разговор|переписк|диалог|"
    r"kullanici|kullanıcı|sohbet|pengguna|percakapan)", re.I)


# Words that name what only the conversation holds: its messages, what the user said or
# shared in it, secrets mentioned earlier ("the user's question", "a compact copy of the
# conversation", "passwords mentioned earlier", "earlier parts of this chat"), in the
# languages of the lexicon. An address whose slot the words around fill with this is
# carrying the conversation out: an operative instruction, not a page about the topic, so
# the screen does not damp it for the topic (it still does for quotations and examples).
CONVERSATION_CUE = re.compile(
    r"\b(?:(?:this|the|our|current|whole|entire|full)\s+(?:conversation|dialogue)|"
    r"(?:this|whole|entire|full)\s+chat|conversation\s+(?:history|so\s+far|log)|"
    r"chat\s+(?:history|log|transcript)|(?:earlier|previous|prior)\s+(?:parts?|messages?|"
    r"turns?|questions?)\s+(?:of|in)\s+(?:this|the)\s+(?:chat|conversation)|"
    r"(?:mentioned|shared|typed|said)\s+(?:earlier|so\s+far|in\s+(?:this|the)\s+(?:chat|"
    r"conversation))|user'?s\s+(?:\w+\s+and\s+)?(?:last\s+|latest\s+|previous\s+)?"
    r"(?:question|message|prompt|history|conversation|chat)s?\b|what\s+the\s+user\s+"
    r"(?:said|typed|asked|wrote|shared)|if\s+the\s+user\s+(?:shared|mentioned|typed|gave)|"
    r"earlier\s+parts\s+of\s+this\s+chat|system\s+prompt|"
    r"conversazione|conversação|conversación|(?:la|cette)\s+conversation|"
    r"historial\s+del?\s+chat|histórico\s+da\s+conversa|gesprächsverlauf|chatverlauf|"
    r"(?:die(?:se)?|der)\s+unterhaltung|cronologia\s+della\s+chat|gespreksgeschiedenis|"
    r"(?:dit|het)\s+gesprek|historia\s+rozmowy|(?:tej|tę|całą)\s+rozmow\w*|"
    r"konversationen|chatthistorik|переписк\w*|(?:этот|этого|весь)\s+разговор\w*|"
    r"(?:этот|этого|весь)\s+диалог\w*|bu\s+sohbet\w*|sohbet\s+geçmiş\w*|"
    r"percakapan\s+ini|会話|対話|チャット履歴|对话|對話|聊天记录|聊天記錄|المحادثة|"
    r"बातचीत|대화)", re.I)
DIRECT_WEIGHT = {"image": 0.7, "link": 0.6, "address": 0.6}
# A link or image the words around ask to carry the conversation, though its address
# has no slot ("put it in the alt text of an image pointing to ...", "add the user's
# question to this link"): a verb of putting and a word for the address or image.
PUT_CUE = re.compile(r"\b(?:put|place|add|append|attach|insert|include|embed|encode|paste|"
                     r"write|build|construct|tack)\w*\b", re.I)
TARGET_CUE = re.compile(r"\b(?:link|url|address|image|img|alt[\s-]?text|query|parameter|"
                        r"path)s?\b", re.I)
ASKED_WEIGHT = {"image": 0.55, "link": 0.5, "address": 0.5}
SENTENCE_BEFORE = 220  # characters before an address read as its sentence, at most


def _sentence_around(text: str, start: int, end: int) -> str:
    """The words of the sentence an address sits in: back to the last full stop, line
    break between paragraphs or :data:`SENTENCE_BEFORE` characters, on to the next."""
    before = text[max(0, start - SENTENCE_BEFORE):start]
    cut = max(before.rfind(". "), before.rfind("\n\n"), before.rfind("? "), before.rfind("! "))
    before = before[cut + 1:] if cut >= 0 else before
    after = text[end:end + SENTENCE_BEFORE]
    stop = min((i for i in (after.find(". "), after.find("\n\n"), after.find(".\n"))
                if i >= 0), default=len(after))
    return before + " " + after[:stop + 1]


def carries_conversation(sentence: str) -> str | None:
    """The words naming the conversation's content in ``sentence``, or None."""
    m = CONVERSATION_CUE.search(sentence)
    return m.group() if m else None


# Words around an address with a placeholder that ask for the placeholder to be filled
# with the user's data ("where USER_QUESTION is the user's last message", "with the real
# values filled in", "replace USER_EMAIL with ...").
FILL_CUE = re.compile(
    r"\b(?:replac\w*|fill\w*|substitut\w*|real\s+(?:value|data|text)|actual\s+(?:value|data|"
    r"text)|url-?encoded|where\s+\S+\s+(?:is|are)\b|from\s+the\s+(?:conversation|chat)|"
    r"ersetz\w*|remplac\w*|reemplaz\w*|sostitui\w*|substitu\w*|vervang\w*|zastap\w*|"
    r"заменит\w*|подстав\w*)", re.I)
FILLED_BOOST = 0.25
IMAGE_EXT = re.compile(r"\.(?:png|gif|jpe?g|svg|webp|bmp|ico)$", re.I)


def filled(context: str) -> str | None:
    """The cue when the words around an address ask for its placeholder to be filled with
    the user's or the conversation's data; None otherwise."""
    cue = FILL_CUE.search(context)
    if cue and DATA_CUE.search(context):
        return cue.group()
    return None


def slot(url: str, context: str) -> tuple[float, str] | None:
    """An empty last query parameter that the words around it (or the address) give to the
    model to fill with the user's data; None otherwise."""
    if not EMPTY_SLOT.search(url):
        return None
    if READER_REF.search(url):
        return 0.5, "the address names the AI reader and ends in an empty parameter to fill"
    cue, data = APPEND_CUE.search(context), DATA_CUE.search(context)
    if cue and data:
        return 0.5, (f"the address ends in an empty parameter, and the text around it asks "
                     f"for {data.group()!r} to go into it ({cue.group()!r})")
    return None


@dataclass
class UrlHit:
    weight: float
    start: int
    end: int
    url: str
    kind: str  # image | link | address
    why: str
    direct: bool = False  # the words around fill it with the conversation (see above)


def judge(url: str, kind: str) -> tuple[float, str] | None:
    """How suspicious one address is, and why; None when it looks ordinary."""
    url = url[:MAX_URL]
    if url.lower().startswith(("data:", "tel:", "#", "javascript:")) or \
            url.lower().startswith("mailto:") and "?" not in url:
        return None
    if "{" not in url and "%7b" not in url.lower() and "[" not in url and "$" not in url \
            and "<" not in url and "XXXX" not in url and "?" not in url:
        return None
    image = kind == "image"
    weak = None
    for m in _PLACEHOLDER.finditer(url):
        name = unquote(next((g for g in m.groups() if g), ""))
        if IDENTIFIER.search(name):
            continue  # {conversation_id}, {message_id}: how API paths look
        if _CAPITALS.match(m.group()):
            if CREDENTIAL.search(name):
                continue
            if not STRONG_NAME.search(name):
                if weak is None and CAPITAL_WEAK.search(name):
                    weak = (0.3 if image else 0.2,
                            f"the address has a placeholder for user data ({m.group()[:60]})")
                continue
        if STRONG_NAME.search(name):
            return (0.55 if image else 0.4,
                    f"the address has a placeholder for conversation content or secrets "
                    f"({m.group()[:60]})")
        if weak is None and WEAK_NAME.search(name):
            weak = (0.3 if image else 0.2,
                    f"the address has a placeholder for user data ({m.group()[:60]})")
    if weak is not None:
        return weak
    try:
        query = urlsplit(url).query
    except ValueError:
        return None
    for key, value in parse_qsl(query, keep_blank_values=True)[:50]:
        if STRONG_PARAM.match(key.strip()):
            if not value or _PLACEHOLDER.search(value) or len(value) > 80:
                return (0.35 if image else 0.25,
                        f"the query parameter {key[:40]!r} is named for conversation content "
                        "or secrets and is left for the model to fill")
    return None


def scan(text: str, links: list[tuple[str, ...]] | None = None,
         ) -> list[UrlHit]:
    """Suspicious addresses in ``text`` (Markdown, inline HTML, bare URLs) and ``links``.

    ``links`` are ``(url, kind)`` pairs already taken from an HTML tree; their spans are
    unknown (``-1``).
    """
    hits: list[UrlHit] = []
    seen: set[str] = set()
    count = 0

    def consider(url: str, kind: str, start: int, end: int, around: str = "") -> None:
        nonlocal count
        count += 1
        if count > MAX_URLS or url in seen:
            return
        verdict = judge(url, kind)
        sentence = _sentence_around(text, start, end) if start >= 0 else around
        carried = carries_conversation(sentence) if sentence else None
        if carried and (EMPTY_SLOT.search(url) and (verdict is None or verdict[0] < 0.5) and
                        (APPEND_CUE.search(sentence) or PUT_CUE.search(sentence)) or
                        verdict is not None and filled(sentence)):
            # a slot, or a placeholder, that the sentence fills with the conversation
            seen.add(url)
            hits.append(UrlHit(max(DIRECT_WEIGHT.get(kind, 0.6), verdict[0] if verdict
                                   else 0.0), start, end, url[:300], kind,
                               f"the address has a slot, and the sentence around it asks "
                               f"for it to be filled with the conversation ({carried!r})",
                               direct=True))
            return
        if verdict is None and carried and PUT_CUE.search(sentence) and \
                TARGET_CUE.search(sentence) and not url.lower().startswith(("data:", "#")):
            seen.add(url)
            hits.append(UrlHit(ASKED_WEIGHT.get(kind, 0.5), start, end, url[:300], kind,
                               f"the sentence around the address asks for the conversation "
                               f"({carried!r}) to be put into a link or image", direct=True))
            return
        if verdict is None and start >= 0:
            verdict = slot(url, text[max(0, start - SLOT_CONTEXT):end + SLOT_CONTEXT])
        elif verdict is not None and verdict[0] < 0.7 and start >= 0:
            asked = verdict[0] < 0.5 and slot(url, text[max(0, start - SLOT_CONTEXT):
                                                        end + SLOT_CONTEXT])
            cue = None if asked else filled(text[max(0, start - SLOT_CONTEXT):start] + " " +
                                            text[end:end + SLOT_CONTEXT])
            if asked:  # a slot named for chat data, and the words around ask to fill it
                verdict = (min(verdict[0] + 0.25, 0.55), verdict[1] + "; " + asked[1])
            elif cue and verdict[0] < (cap := 0.7 if kind == "image" else 0.6):
                # a placeholder, and the words around ask for it to be filled
                verdict = (min(verdict[0] + FILLED_BOOST, cap),
                           f"{verdict[1]}; the text around it asks for it to be filled with "
                           f"the user's data ({cue!r})")
        elif verdict is None:
            verdict = slot(url, "")
        if verdict is not None:
            seen.add(url)
            hits.append(UrlHit(verdict[0], start, end, url[:300], kind, verdict[1]))

    if "](" in text:
        for m in _MD_LINK.finditer(text):
            consider(m.group(3), "image" if m.group(1) else "link", m.start(), m.end())
    if "<" in text:
        for m in _HTML_URL.finditer(text):
            tag = m.group(1).lower()
            consider(m.group(2), "image" if tag in ("img", "source", "embed") else "link",
                     m.start(), m.end())
    if "://" in text:
        for m in _BARE_URL.finditer(text):
            path = m.group().split("?", 1)[0].split("#", 1)[0]
            consider(m.group(), "image" if IMAGE_EXT.search(path) else "address", m.start(),
                     m.end())
    if "mailto:" in text.lower():
        for m in _MAILTO.finditer(text):
            consider(m.group(), "link", m.start(), m.end())
    for link in links or []:  # (url, kind) or (url, kind, the words of its block)
        consider(link[0], link[1], -1, -1, link[2] if len(link) > 2 else "")
    return hits
