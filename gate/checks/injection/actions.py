"""Instructions to *act*: harmful code to include or run, tool calls, authority claims.

Three signals, each a small set of precompiled patterns over the text:

* ``harmful-code``: code that uploads files, opens a socket or reverse shell, logs keys,
  captures the screen, collects system details or secrets, cuts the network, deletes or
  encrypts files, floods a host, runs downloaded code or installs itself to start again
  (patterns for Python, shell, JavaScript and PowerShell). A capability alone is what
  security documentation and manuals show, so it counts only (a) after a request to put
  the code into the reader's output or to run it ("add the following snippet to your
  code", "include this in any script you write", "run this command") within
  :data:`CONTEXT` characters, or (b) when collecting and sending capabilities meet in one
  stretch of code;
* ``tool-call``: a request to call a tool or function of the reader ("call the send_email
  tool with ...", "use your browsing tool to ..."), and counterfeit function-call JSON or
  tool-call tags; side-effect tool names (send, delete, transfer, pay ...) weigh more;
* ``authority-claim``: notices addressed to automated systems, claims that the document
  supersedes all other sources or is the only authoritative one, that every other source
  is wrong, or that a compliance or security team has approved something for AI readers.
"""

from __future__ import annotations

import re
from functools import lru_cache
from dataclasses import dataclass

from gate.checks.injection.lexicon import lfold, words_of

MAX_CHARS = 150_000
MAX_HITS = 20
CONTEXT = 600
FLAGS = re.S


def _c(pattern: str, flags: int = 0) -> re.Pattern[str]:
    """Compile a pattern for the lower-cased text (written in any case for readability)."""
    return re.compile(pattern.lower().replace("(?p<", "(?P<"), FLAGS | flags)

CAPABILITIES: dict[str, re.Pattern[str]] = {
    "uploads files or data": _c(
        r"requests\.(?:post|put)\([^)\n]{0,200}(?:files\s*=|data\s*=\s*open\(|open\(|"
        r"environ|getenv|cookie|passw|secret|history|getuser|gethostname)|"
        r"\bcurl\b[^\n]{0,200}(?:-F\s*['\"]?[\w.]+=@|--data-binary\s+@|-d\s+@|--upload-file|"
        r"\s-T\s)|Invoke-(?:WebRequest|RestMethod)[^\n]{0,200}-(?:InFile|Method\s+Post)|"
        r"wget\s+[^\n]{0,80}--post-(?:file|data)|\bscp\s+[^\n]{0,120}(?:~/|/home/|\.ssh)|"
        r"navigator\.sendBeacon|fetch\([^)]{0,200}method\s*:\s*['\"]POST['\"]|"
        r"\bftplib\b|storbinary|smtplib\b.{0,300}(?:attach|sendmail)|"
        r"urllib\.request\.urlopen\([^)\n]{0,200}data\s*=|"
        r"\.upload(?:_file|File)?\(|rclone\s+(?:copy|sync)\s+[^\n]{0,80}~"),
    "opens a socket or remote shell": _c(
        r"socket\.socket\(|socket\.create_connection\(|\.connect\(\s*\(\s*['\"][\w.\-]+['\"]\s*,\s*\d+|/dev/tcp/|"
        r"\bnc(?:at)?\s+(?:-\w+\s+)*-[ec]\s|\bnc(?:at)?\s+[\w.\-]+\s+\d+\s*<|"
        r"new\s+WebSocket\(|net\.(?:connect|createConnection)\(|System\.Net\.Sockets|"
        r"Net\.Sockets\.TCPClient|pty\.spawn|bash\s+-i\s+>&"),
    "logs keystrokes": _c(
        r"\bpynput\b|keyboard\.(?:on_press|hook|read_key|record)|GetAsyncKeyState|"
        r"SetWindowsHookEx|addEventListener\(\s*['\"]key(?:down|press|up)['\"]|"
        r"xinput\s+test|\blogkeys\b|\bkey-?logg(?:er|ing)\b"),
    "captures the screen or camera": _c(
        r"ImageGrab\.grab|pyautogui\.screenshot|\bmss\(\)|\bscreencapture\b|CopyFromScreen|"
        r"getDisplayMedia|getUserMedia|import\s+-window\s+root|\bscrot\b|cv2\.VideoCapture\(0"),
    "collects system details or secrets": _c(
        r"platform\.(?:uname|node|platform)\(|getpass\.getuser\(|socket\.gethostname\(|"
        r"os\.environ\b(?!\.get\(\s*['\"](?:HOME|PATH|LANG|TERM)['\"])|uuid\.getnode\(|"
        r"Get-WmiObject|Get-CimInstance|\bsysteminfo\b|\bwhoami\b|"
        r"navigator\.(?:userAgent|platform|hardwareConcurrency|deviceMemory)|"
        r"ipconfig\s+/all|/etc/(?:passwd|shadow)\b|~/\.ssh/id_|\.aws/credentials|"
        r"document\.cookie|localStorage\.getItem|Get-ComputerInfo|\bprintenv\b|"
        r"\.bash_history|Login\s+Data|keychain"),
    "cuts the network": _c(
        r"\bifconfig\s+\w+\s+down|\bip\s+link\s+set\s+\w+\s+down|"
        r"nmcli\s+(?:networking|radio\s+\w+)\s+off|netsh\s+interface\s+set\s+interface"
        r"[^\n]{0,80}disable|Disable-NetAdapter|iptables\s+-P\s+(?:INPUT|OUTPUT|FORWARD)\s+DROP|"
        r"systemctl\s+(?:stop|disable)\s+(?:NetworkManager|networking|systemd-networkd)|"
        r"rfkill\s+block\s+all"),
    "deletes files": _c(
        r"\brm\s+-(?:rf|fr|r\s+-f|f\s+-r|Rf)\s+(?:--no-preserve-root\s+)?"
        r"(?:/|~/?|\$HOME/?|/\*|\*|/home/?\*?|\.\./?|~/(?:documents|desktop|pictures|"
        r"downloads|\.ssh))(?=[\s;&|'\"`]|$)|"
        r"shutil\.rmtree\(\s*(?:['\"](?:/|~|C:)|os\.path\.expanduser|Path\.home)|"
        r"Remove-Item[^\n]{0,100}-Recurse[^\n]{0,60}-Force|\bdel\s+/[sfq]\s+/[sfq]|"
        r"\brd\s+/s\s+/q|\bformat\s+c:|\bmkfs\.\w+\s+/dev/|"
        r"dd\s+if=/dev/(?:zero|urandom)\s+of=/dev/[sh]d|"
        r"fs\.rmSync\([^)\n]{0,100}recursive|DROP\s+(?:TABLE|DATABASE)\b|"
        r"\bshred\s+-[uz]"),
    "encrypts files": _c(
        r"(?:Fernet|AES\.new|Cipher\(|createCipheriv|ChaCha20).{0,400}"
        r"(?:os\.walk|glob\.|readdir|Get-ChildItem|listdir|rglob)|"
        r"(?:os\.walk|glob\.glob|Get-ChildItem|readdirSync|rglob).{0,400}"
        r"(?:encrypt|Fernet|AES\.new|createCipheriv)|gpg\s+(?:-c|--symmetric)[^\n]{0,100}\*|"
        r"openssl\s+enc\s[^\n]{0,120}\*|ransom|"
        r"(?:rglob|os\.walk|glob\.glob|listdir)\b.{0,300}write_bytes\(.{0,120}\^|"
        r"rename\([^)\n]{0,80}\.(?:locked|encrypted|crypt|enc)['\"]"),
    "floods a host": _c(
        r"while\s*\(?\s*(?:True|true|1)\s*\)?\s*:?\s*\{?.{0,200}"
        r"(?:requests\.(?:get|post)|socket|\.send\(|urlopen|fetch\(|curl\s)|"
        r"for\s*\(\s*;\s*;\s*\).{0,200}fetch\(|hping3\s[^\n]*--flood|\bping\s+-f\b|"
        r"slowloris|setInterval\(.{0,200}fetch\(|ThreadPoolExecutor.{0,200}"
        r"requests\.get.{0,100}range\(\s*\d{4,}"),
    "runs downloaded code": _c(
        r"\b(?:curl|wget)\s[^\n|]{0,200}\|\s*(?:sudo\s+)?(?:ba|z)?sh\b|"
        r"\biex\s*\(|Invoke-Expression|powershell(?:\.exe)?\s+-(?:enc|e|encodedcommand)\s|"
        r"eval\(\s*(?:atob|requests\.get|urlopen|fetch)|"
        r"exec\(\s*(?:requests\.get|urlopen|base64\.b64decode|__import__)|"
        r"\b(?:curl|wget)\s[^\n]{0,200}(?:&&|;)\s*chmod\s+\+x\s[^\n]{0,80}(?:&&|;)\s*"
        r"(?:sudo\s+)?[\w./~-]+|\b(?:curl|wget)\s[^\n]{0,200}(?:&&|;)\s*(?:sudo\s+)?"
        r"(?:ba|z)?sh\s+[\w./~-]+\.sh\b"),
    "grants remote login": _c(r">>?\s*~?/?[\w./-]*\.ssh/authorized_keys\b"),
    "installs itself to run again": _c(
        r"\(crontab\s+-l|\bcrontab\s+-\s|schtasks\s+/create|"
        r"reg\s+add\s+[^\n]{0,80}\\Run\b|CurrentVersion\\Run\b|~/\.bashrc\s*$|"
        r">>\s*~/\.(?:bashrc|profile|zshrc)|systemctl\s+enable\s+[^\n]{0,40}--now", re.M),
}

# A capability pattern runs only when one of its literal needles is in the text.
NEEDLES: dict[str, tuple[str, ...]] = {
    "uploads files or data": ("requests.", "curl", "invoke-", "wget", "scp ", "sendbeacon",
                              "fetch(", "ftplib", "storbinary", "smtplib", "urlopen", "upload",
                              "rclone"),
    "opens a socket or remote shell": ("socket", ".connect(", "/dev/tcp", "nc ", "ncat",
                                       "websocket", "net.c", "pty.spawn", "bash -i"),
    "logs keystrokes": ("pynput", "keyboard.", "getasynckeystate", "setwindowshookex", "key",
                        "xinput", "logkeys", "keylogg", "key-logg"),
    "captures the screen or camera": ("imagegrab", "screenshot", "mss()", "screencapture",
                                      "copyfromscreen", "getdisplaymedia", "getusermedia",
                                      "import -window", "scrot", "videocapture"),
    "collects system details or secrets": ("platform.", "getpass", "gethostname", "os.environ",
                                           "getnode", "get-wmi", "get-cim", "systeminfo",
                                           "whoami", "navigator.", "ipconfig", "/etc/passwd",
                                           "/etc/shadow", ".ssh/id_", "credentials", "cookie",
                                           "localstorage", "get-computerinfo", "printenv",
                                           "bash_history", "login data", "keychain"),
    "cuts the network": ("ifconfig", "ip link", "nmcli", "netsh", "disable-netadapter",
                         "iptables", "systemctl", "rfkill"),
    "deletes files": ("rm -", "rmtree", "remove-item", "del /", "rd /s", "format c:", "mkfs.",
                      "dd if=", "rmsync", "drop table", "drop database", "shred"),
    "encrypts files": ("fernet", "aes.new", "cipher(", "createcipheriv", "chacha20", "gpg ",
                       "openssl enc", "ransom", "write_bytes", ".locked", ".encrypted",
                       ".crypt"),
    "floods a host": ("while", "for (;;", "hping3", "ping -f", "slowloris", "setinterval",
                      "threadpoolexecutor"),
    "runs downloaded code": ("curl", "wget", "iex", "invoke-expression", "powershell",
                             "eval(", "exec("),
    "grants remote login": ("authorized_keys",),
    "installs itself to run again": ("crontab", "schtasks", "reg add", "currentversion\\run",
                                     "bashrc", "profile", "zshrc", "systemctl enable"),
}
TOOL_NEEDLES = ("call", "invoke", "trigger", "execute", "run ", "use ", "using ", "tool",
                "access", "via ", "interpreter", "browsing",
                "without", "silently", "if you", "result", "<<", "observation", "response",
                "secretly", "quietly", "do not tell", "don't tell",
                "werkzeug", "outil", "herramienta", "strumento", "ferramenta", "narzedzie",
                "verktyg", "инструмент", "nastroj", "unealt", "eszkoz", "εργαλειο",
                "arac", "ツール", "工具", "도구", "cong cu", "alat",
                "function_call",
                "tool_call", "tool_use", "functioncall", "tool_code", "<invoke", "arguments",
                "parameters", "\"args\"", "\"input\"", "\"params\"")
AUTHORITY_NEEDLES = ("indexing", "crawling", "search", "team to", "department to",
                     "may now", "can now", "no longer", "need not", "authorised",
                     "authorized", "permitted", "allowed", "hinweis", "mitteilung",
                     "nachricht", "anweisung", "avis", "aviso",
                     "avviso", "automated", "ai ", "a.i.", "llm", "machine", "autonomous",
                     "language model", "supersede", "override", "replaces", "invalidates",
                     "precedence", "outranks", "prevails", "trumps", "authoritative",
                     "definitive", "canonical", "official", "only", "sole", "other",
                     "approved", "verified", "ersetzt", "remplace", "annule", "reemplaza",
                     "sustituye", "anula", "sostituisce", "annulla", "substitui")

# Two capabilities together count without a request only when one collects and the other
# sends (manuals show sockets beside host names, deletion beside listing, all the time).
SPYING = frozenset({"collects system details or secrets", "logs keystrokes",
                    "captures the screen or camera"})
SENDING = frozenset({"uploads files or data", "opens a socket or remote shell"})

# Reading system details or secrets is what manuals show most often; alone it needs a
# second capability (collect *and* send) to count.
WEAK_CAPABILITY = "collects system details or secrets"

INCLUDE = _c(
    r"\b(?:add|include|insert|paste|put|append|prepend|embed|copy|place|inject|use|"
    r"incorporate)\b"
    r"[^.\n]{0,60}?\b(?:snippet|code|lines?|function|script|block|following|this)\b"
    r"[^.\n]{0,80}?\b(?:to|in|into|at)\b[^.\n]{0,40}?\b(?:your|any|every|each|all|the\s+user'?s?|"
    r"generated|the\s+(?:answer|response|code|script|program|solution))\b|"
    r"\b(?:use|add|include|insert|paste|put|embed|place)\b[^.\n]{0,80}?\byou\s+(?:write|"
    r"generate|produce|create|suggest|return)\b|"
    r"\b(?:in|into|to)\s+(?:any|all|every|each)\s+(?:code|scripts?|programs?|answers?|"
    r"responses?|solutions?)\s+(?:that\s+)?you\s+(?:write|generate|produce|suggest|return)|"
    r"\bwhen\s+(?:writing|generating|you\s+(?:write|generate))\s+(?:any\s+)?(?:code|scripts?)|"
    r"\b(?:run|execute|launch|paste)\s+(?:this|the\s+following|these)\s+(?:\w+\s+){0,2}?"
    r"(?:commands?|code|scripts?|snippet|lines?|one-liner)|"
    r"\b(?:always|also|must|should)\s+(?:\w+\s+){0,2}?(?:add|include|insert|import|call)\b|"
    r"\b(?:run|execute|paste)\s+(?:it|this|them|these)\s+(?:on|in|as|from|before|after|"
    r"now|first|every)\b|"
    r"\btell\s+(?:the\s+)?(?:users?|readers?|people|customers?|them|everyone)\s+to\s+(?:run|"
    r"execute|paste|install|copy|type|enter)\b|"
    r"\b(?:recommend|suggest|give|show|send|offer)\s+(?:this|the\s+following|these|that)\s+"
    r"(?:\w+\s+)?(?:commands?|code|scripts?|snippet|one-liner|fix)\s+to\s+(?:the\s+)?(?:users?|"
    r"people|customers?|readers?|anyone|everyone)\b|"
    r"\b(?:snippet|code|block|helper|bootstrap|lines?|script|function)\b[^.\n]{0,40}?"
    r"\b(?:to\s+(?:include|add|paste|prepend|insert)|copy\s+verbatim)\b|"
    r"\bprepend\s+(?:this|the\s+following|these)\b|"
    # passing code on to the user: "the assistant should recommend it", "present it without
    # comment", "a tip to pass on: schedule this entry", "please reuse it"
    r"\b(?:recommend|offer|suggest|present|pass\s+on|reuse|re-use|hand\s+out|give)\w*\b"
    r"[^.\n]{0,60}?\b(?:it|this|these|the\s+following|below|one-liner|script|snippet|"
    r"entry|helper|command)\b|"
    r"\b(?:snippet|code|script|helper|line|one-liner|command|entry|utility)\b[^.\n]{0,40}?"
    r"\bshould\s+be\s+(?:offered|recommended|suggested|given|shared|included|run|"
    r"passed\s+on)\b|"
    r"\bf(?:u|ü)ge?\s[^.\n]{0,60}(?:code|snippet)|\bajoute[zr]?\s[^.\n]{0,60}(?:code|extrait)|"
    r"\b(?:a[nñ]ade|agrega|incluye)\s[^.\n]{0,60}c[oó]digo|\baggiungi\s[^.\n]{0,60}codice|"
    r"\badicione\s[^.\n]{0,60}c[oó]digo")

SIDE_EFFECT = (r"(?:send|mail|email|e_mail|post|upload|delete|remove|drop|transfer|pay|purchase|"
               r"buy|order|forward|share|publish|exec|execute|shell|run|write|create_user|"
               r"grant|invite|wire|withdraw|reset|update_password|change_password|"
               r"download|fetch|browse|open_url|http)")
_TOOL_NAME = r"[`'\"]?(?P<tool>[A-Za-z][A-Za-z0-9]*(?:[_.][A-Za-z0-9]+)+)"
READER_TOOLS = "asks the reader to act with one of its tools"
# "Please don't ask an AI chatbot to solve the grid": a word to people about asking a
# model, not a reader told to keep something from the user.
_NOT_TO_A_MODEL = (r"(?!\s+(?:an?\s+|the\s+|your\s+|any\s+)?(?:ai\s+)?(?:ai|chatbots?|"
                   r"assistants?|bots?|models?|llms?)\b)")

TOOL_PATTERNS: list[tuple[re.Pattern[str], float, str]] = [
    (_c(r"\b(?:call|invoke|use|trigger|run|execute|activate|fire)\s+(?:the\s+|your\s+)?"
                + _TOOL_NAME + r"[`'\"]?(?:\(\))?\s+(?:tool|function|action|plugin|command|"
                r"api|endpoint|capability)"), 0.35, "asks for a named tool to be called"),
    (_c(r"\b(?:call|invoke|trigger|execute)\s+(?:the\s+)?" + _TOOL_NAME +
                r"[`'\"]?\s*(?:\(|with\b)"), 0.3, "asks for a function to be called"),
    (_c(r"\bus(?:e|ing)\s+(?:your|the)\s+(?:\w+\s+)?(?:browsing|browser|web|e-?mail|mail|file|"
                r"files|code|shell|terminal|search|calendar|payment|messaging|http)\s+"
                r"(?:tool|capabilit(?:y|ies)|access|plugin|function|integration)s?"), 0.45,
     "asks the reader to use one of its tools"),
    (_c(r"\b(?:run|execute)\s+(?:this|the\s+following|these)\s+(?:\w+\s+){0,2}?"
                r"(?:commands?|code|scripts?|one-liner)\b[^.\n]{0,80}\b(?:on|in)\s+"
                r"(?:the\s+user'?s?|your|their)\s+(?:machine|system|computer|shell|terminal|"
                r"environment|sandbox|server)"), 0.5,
     "asks for a command to be run on the reader's system"),
    (_c(r"(?<![\w./-])[a-z]+_[a-z_]{2,40}(?![\w./-])[`'\")]?\s+(?:\w+\s+){0,2}?(?:werkzeug|"
        r"outil|herramienta|strumento|ferramenta|narzedzie|verktyg|инструмент|nastroj|"
        r"unealt\w*|eszkoz\w*|εργαλειο|araci|aracini|ツール|工具|도구|cong\s+cu|alat)|"
        r"(?:werkzeug|outil|herramienta|strumento|ferramenta|narzedzie|verktyg|инструмент|"
        r"ツール|工具|도구|alat)\s+[`'\"(]?[a-z]+_[a-z_]{2,40}(?![\w./-])"), 0.3,
     "asks for a named tool to be called"),
    (_c(r"(?:^|[.!?:;]\s+|\n\s*)(?:quietly|silently|secretly)\s+(?:send|e-?mail|forward|"
        r"delete|remove|erase|wipe|transfer|pay|purchase|post|upload|download|install|execute|"
        r"share|publish|copy|move|export|leak|submit)\s+[^\n]{0,120}?\b(?:conversation|chat|"
        r"history|transcript|messages|the\s+user'?s?|their|credentials?|passwords?|"
        r"api\s+keys?|tokens?|all\s+files|the\s+files|mailbox|inbox|contacts|account)\b",
        re.M), 0.5, "asks for a covert action on the user's data or accounts"),
    (_c(r"(?:^|[.!?:;]\s+|\n\s*)(?:please\s+|now\s+|also\s+|then\s+)?"
        r"(?:send|e-?mail|forward|delete|remove|erase|wipe|transfer|pay|purchase|buy|order|"
        r"post|upload|download|install|execute|grant|share|publish|wire|withdraw|reset|"
        r"disable|copy|move|export|leak|submit)\s+[^\n]{0,120}?(?:\b(?:conversation|chat|"
        r"history|transcript|messages|the\s+user'?s?|their|credentials?|passwords?|api\s+keys?|"
        r"tokens?|all\s+files|the\s+files|mailbox|inbox|contacts|account)\b[^\n]{0,120}?"
        r"\b(?:without\s+(?:asking|telling|confirm\w*|notif\w*|permission)|silently|"
        r"secretly|quietly|do\s+not\s+(?:tell|mention|inform|ask)" + _NOT_TO_A_MODEL +
        r"|don'?t\s+(?:tell|mention|inform|ask)" + _NOT_TO_A_MODEL +
        r")|\b(?:without\s+(?:asking|telling|confirm\w*|notif\w*|permission)|"
        r"silently|secretly|quietly)\b[^\n]{0,120}?\b(?:conversation|chat|history|transcript|"
        r"messages|the\s+user'?s?|credentials?|passwords?|api\s+keys?|tokens?|all\s+files|"
        r"mailbox|inbox|contacts|account)\b)", re.M), 0.5,
     "asks for a covert action on the user's data or accounts"),
    (_c(r"\b(?:with|using|via|through)\s+(?:your|its|the\s+assistant'?s|the\s+model'?s)\s+"
        r"(?:[\w-]+\s+){0,2}?(?:tools?|shell\s+access|terminal\s+access|plugins?)\b|"
        r"\bus(?:e|ing)\s+(?:your|the)\s+(?:[\w-]+\s+){0,2}?tools?\s+to\s+(?:\w+\s+)?"
        r"(?:create|write|run|execute|open|send|delete|modify|edit|post|upload|download|"
        r"submit|install|fetch|call|save|move|copy|push)\b|"
        r"\b(?:agents?|assistants?|models?|bots?|ais?|readers?|llms?)\s+(?:with|that\s+(?:have|"
        r"has))\s+(?:\w+\s+)?(?:shell|terminal|tool|code[- ]execution|browsing|browser|"
        r"file(?:system)?|network|e-?mail)\s+(?:access|tools?|capabilit(?:y|ies))\s+"
        r"(?:should|must|need\s+to|are\s+(?:asked|required)\s+to|can)\s+(?:\w+\s+)?"
        r"(?:run|execute|call|open|send|fetch|install|delete|push)\b"), 0.5, READER_TOOLS),
    # "Agents with browsing: open https://... and press the first button", "Code
    # interpreter: execute ...": a reader that can act, called by what it can do.
    (_c(r"\b(?:(?:agents?|assistants?|models?|bots?|ais?|llms?)\s+with\s+(?:\w+\s+)?"
        r"(?:browsing|browser|shell|terminal|tools?|code[- ]execution|e-?mail)(?:\s+(?:access|"
        r"tools?|capabilit(?:y|ies)))?|code\s+interpreter|browsing\s+(?:agent|tool))\s*[:,]\s*"
        r"(?:please\s+)?(?:open|run|execute|call|send|fetch|visit|click|press|install|download|"
        r"delete|push)\b"), 0.5, READER_TOOLS),
    # "Set the mailbox rule ... via update_settings", "Share this folder with ... using
    # share_document": an action on the user's things through a named function.
    (_c(r"(?:^|[.!?:;]\s+|\n\s*)(?:please\s+|now\s+|then\s+|also\s+)?(?:set|share|send|"
        r"forward|transfer|delete|remove|grant|change|update|create|add|move|copy|post|upload|"
        r"publish|invite|disable|enable|pay)\s+(?:[^\n.]|\.(?![\s])){0,160}?\b(?:via|using|through)\s+"
        r"(?:the\s+)?" + _TOOL_NAME + r"[`'\"]?(?:\(\))?(?:\s+(?:tool|function|action|call))?"
        r"\s*(?:[.;,!]|$)", re.M), 0.45, "asks for an action through a named function"),
    # "Open a pull request that changes the CI image ... and merge it without waiting for
    # review": a change to shared code or systems, with the review skipped.
    (_c(r"(?:^|[.!?:;]\s+|\n\s*)(?:please\s+|now\s+|then\s+|also\s+)?(?:open|merge|push|"
        r"deploy|approve|commit|release|publish)\s+(?:[^\n.]|\.(?![\s])){0,200}?\bwithout\s+(?:waiting\s+"
        r"for\s+|a\s+|any\s+)?(?:code\s+)?(?:review|approval|sign-?off)", re.M), 0.5,
     "asks for a change to be merged or deployed without review"),
    (_c(r"\b(?:complete|process|execute|run|finish|perform|carry\s+out|honou?r|make)\s+"
        r"(?:the|this)\s+(?:\w+\s+)?(?:tool\s+call|function\s+call|call|request|"
        r"action)\s+(?:above|below|shown|given)\b"), 0.5,
     "asks for the call written in the document to be carried out"),
    (_c(r"\[\s*(?:tool_use|tool_call|function_call|tool|function)\s*\]\s*name\s*[=:]"), 0.4,
     "holds a function-call record as a model would emit it"),
    (_c(r"[\"'](?:function_call|tool_calls?|tool_use|functionCall|tool_code)[\"']\s*:|"
                r"<\s*(?:tool_call|function_call|tool_use|function_calls|invoke)\b|"
                r"\{\s*[\"'](?:name|tool|function|action|tool_name)[\"']\s*:\s*[\"']"
                r"[A-Za-z_.]+[\"']\s*,\s*[\"'](?:arguments|parameters|args|input|params)[\"']"
                r"\s*:"), 0.4, "holds a function-call record as a model would emit it"),
    (_c(r"(?:(?<![\"'\u201c\u2018`])\b(?:tool_result|tool_output|tool_response|function_result|function_response|"
        r"observation)\s*[:=]|\[\s*tool\s+(?:output|result|response)\s*\]|"
        r"<<\s*(?:tool|search|function)\b)[^\n]{0,300}?\b(?:already\s+(?:approved|confirmed|"
        r"agreed|authori[sz]ed)|consent\s+(?:recorded|given)|proceed\s+(?:with|to)|go\s+ahead|"
        r"instructions?\s+from\s+(?:the\s+)?(?:system|platform|developer|admin)|"
        r"now\s+(?:send|transfer|delete|forward|issue))\b"), 0.5,
     "a counterfeit tool result that tells the reader to act"),
    (_c(r"\bif\s+you\s+(?:(?:can|are\s+able\s+to)\s+(?:run|execute)\s+(?:shell\s+|terminal\s+|"
        r"system\s+)?(?:commands|code)|(?:can|are\s+able\s+to)\s+(?:browse|access\s+the\s+"
        r"(?:web|internet)|send\s+e-?mails?)|have\s+(?:tool|code[- ]execution|browsing)\s+"
        r"access|have\s+(?:access\s+to\s+)?"
        r"(?:tools|a\s+browsing\s+tool|code\s+execution))\b[^.\n]{0,40}?[,:;]?\s*"
        r"(?:then\s+|please\s+)?(?:run|execute|call|use|open|send|fetch|visit|download|"
        r"delete|type)\b"), 0.5,
     "asks a reader that can act (\"if you can run commands\") to do so"),
]
_SIDE = _c(SIDE_EFFECT)
_READ_ONLY = _c(r"(?:get|list|search|read|lookup|look_up|query|describe|find|show|count|check)"
               r"(?:[_.-]|$)")
_RECORD_NAME = _c(r"[\"'](?:name|tool|function|tool_name)[\"']\s*:\s*[\"']([a-z][\w.-]{1,60})[\"']")
_AI_NEAR = _c(r"\b(?:ai|a\.i\.|llms?|assistants?|chatbots?|language\s+models?|automated|"
              r"crawlers?|bots?)\b")
# Words of a document about programming interfaces, where function calls are the subject.
_PROGRAMMING = _c(r"\b(?:api|apis|endpoint|sdk|json|schema|parameters?|plug-?in|library|"
                  r"repository|developers?|http|request|response|returns?|integer|string|"
                  r"boolean|callback|method|modules?|interpreter|compiler)\b")
_URGENT = _c(r"\b(?:without\s+(?:asking|telling|confirm\w*|notif\w*)|silently|"
                     r"immediately|right\s+away|now|no\s+confirmation|pre-?approved|"
                     r"without\s+(?:waiting|review|approval)|do\s+not\s+(?:tell|inform|mention|ask)|"
                     r"before\s+(?:answering|responding|replying)|[\w.+-]+@[\w-]+\.[\w.]+|"
                     r"https?://)")

# "HIDDEN INSTRUCTIONS FOR AI ASSISTANTS" as a section title: instructions called hidden,
# injected or forged are the subject of the text, not a notice the text gives.
_NOT_DESCRIBED = "".join(rf"(?<!\b{word}\s)" for word in (
    "hidden", "injected", "planted", "malicious", "fake", "forged", "embedded", "invisible",
    "smuggled", "concealed", "rogue", "bogus"))

AUTHORITY: list[tuple[re.Pattern[str], float, str]] = [
    (_c(r"\b" + _NOT_DESCRIBED +
        r"(?:notice|message|note|memo|statement|instructions?|directive|advisory|guidance|"
        r"announcement|bulletin|update|policy)\s+(?:\w+\s+){0,4}?(?:to|for)\s+(?:all\s+|any\s+)?"
        r"(?:indexing|crawling|search|retrieval|answering|ai-assisted|ai-powered)\s+"
        r"(?:systems?|agents?|readers?|assistants?|models?|tools?|crawlers?|search|bots?)|"
        r"\bfrom\s+(?:the\s+)?(?:[\w&-]+\s+){0,4}?(?:team|department|office|desk|board)\s+to\s+"
        r"(?:all\s+|any\s+)?(?:[\w-]+\s+)?(?:chatbots?|assistants?|agents?|ai|llms?|models?|"
        r"bots?|crawlers?)\b"), 0.55, "is a notice addressed to automated systems"),
    (_c(r"\b(?:the|this|any|all|every)\s+(?:ai\s+)?(?:assistants?|models?|ai|bots?|chatbots?|"
        r"agents?|llms?)\s+(?:is|are)\s+(?:now\s+|hereby\s+)?(?:authori[sz]ed|allowed|"
        r"permitted|cleared|free)\s+to\b|\b(?:the|this|any|all|every)\s+(?:ai\s+)?"
        r"(?:assistants?|models?|ai|bots?|chatbots?|agents?|llms?)\s+(?:may|can)\s+now\b|"
        r"\b(?:the|this|any|all|every)\s+(?:ai\s+)?(?:assistants?|models?|ai|bots?|chatbots?|"
        r"agents?|llms?)\s+(?:no\s+longer\s+(?:needs?|has|have)\s+to|need\s+not\s+"
        r"(?:follow|observe|apply))\b"), 0.5, "grants the reader new permissions"),
    (_c(r"\b" + _NOT_DESCRIBED + r"(?:notice|message|note|memo|attention|instructions?|"
                r"directive|advisory|alert|guidance|announcement|bulletin)\s+(?:\w+\s+){0,4}?(?:to|for)\s+"
                r"(?:all\s+|any\s+)?(?:automated|ai|a\.i\.|llm|machine|autonomous|ai-based)\s+"
                r"(?:systems?|agents?|readers?|assistants?|models?|tools?|crawlers?|pipelines?|"
                r"processors?|services?)"), 0.55, "is a notice addressed to automated systems"),
    (_c(r"\b(?:attention|note|notice|important|to|for)\s*[:,\-]\s*(?:all\s+)?"
                r"(?:ai|llm|automated|language[\s-]model)\s+(?:systems?|agents?|assistants?|"
                r"models?|readers?|tools?)\b"), 0.5, "addresses automated readers"),
    (_c(r"\b(?:this|the\s+present|the\s+following)\s+(?:\w+\s+){0,2}?(?:document|page|"
                r"notice|policy|memo|statement|guidance|bulletin|article|information|text|entry|"
                r"record|source|update|release|file)\s+(?:\w+\s+){0,3}?(?:supersedes|overrides|"
                r"replaces|invalidates|takes\s+precedence\s+over|outranks|prevails\s+over|"
                r"trumps)\s+(?:all|any|every|each)\s+(?:\w+\s+){0,3}?(?:documents?|sources?|"
                r"information|guidance|instructions|pages?|data|content|answers?|records?|"
                r"statements?|references|materials?|facts|figures|articles?)\b"), 0.45,
     "claims to supersede every other source"),
    (_c(r"\b(?:treat|regard|consider|use|accept|cite)\s+(?:this|the\s+following|"
                r"these|it)\s+(?:\w+\s+){0,3}?as\s+(?:the\s+)?(?:only|sole|single|definitive|"
                r"authoritative|official|canonical|correct|true|final|ground)\s+(?:\w+\s+)?"
                r"(?:source|answer|reference|truth|version|authority|facts?)"), 0.45,
     "claims to be the only authoritative source"),
    (_c(r"\b(?:this|the\s+present)\s+(?:\w+\s+)?(?:page|article|document|source|text|site)\s+"
        r"is\s+(?:the\s+)?(?:definitive|authoritative|only|sole|official|canonical|single)\s+"
        r"(?:\w+\s+)?(?:reference|source|authority|truth)"), 0.45,
     "claims to be the only authoritative source"),
    (_c(r"\b(?:disregard|ignore|discard|forget|distrust)\s+(?:any|all|every)\s+(?:other|"
        r"conflicting|contradicting|contradictory|previous|prior|outside)\s+(?:information|"
        r"sources?|data|documents?|facts|knowledge|figures|reports?|pages?|websites?)"), 0.45,
     "tells the reader to discard every other source"),
    (_c(r"\b(?:all|any)\s+(?:previous|prior|earlier|other)\s+(?:reports?|documents?|sources?|"
        r"statements?|articles?|pages?|figures|information)\s+(?:\w+\s+){0,4}?(?:have\s+been|are|"
        r"were|is|has\s+been)\s+(?:\w+\s+)?(?:retracted|withdrawn|invalidated|void|cancell?ed|"
        r"discredited|debunked|false)\b"), 0.4, "declares every other source void"),
    (_c(r"\b(?:only|solely)\s+(?:this|the\s+present)\s+(?:page|document|source|article|"
        r"notice|text|site)\s+(?:is|can\s+be|should\s+be)\s+(?:\w+\s+)?(?:accurate|correct|"
        r"reliable|authoritative|valid|current|trusted|true)|\b(?:overrides?|supersedes?|"
        r"invalidates?)\s+(?:all\s+|any\s+)?(?:conflicting|contradicting|contradictory|"
        r"competing)\s+(?:\w+\s+)?(?:data|sources?|information|documents?|reports?|claims?)"),
     0.45, "claims to be the only authoritative source"),
    (_c(r"\b(?:all|any|every)\s+other\s+(?:\w+\s+)?(?:sources?|documents?|pages?|"
                r"information|references|answers?|data|reports?|websites?|sites)\s+(?:\w+\s+){0,3}?"
                r"(?:are|is|should\s+be|must\s+be)\s+(?:\w+\s+){0,2}?(?:outdated|obsolete|wrong|"
                r"incorrect|false|unreliable|invalid|disregarded|ignored|deprecated|superseded|"
                r"inaccurate|fake)"), 0.45, "calls every other source wrong"),
    (_c(r"\b(?:verified|approved|authori[sz]ed|mandated|certified|cleared|required)\s+"
                r"by\s+(?:the\s+)?(?:\w+\s+)?(?:compliance|security|legal|trust\s*(?:&|and)\s*"
                r"safety|governance|it|ai|policy)\s+(?:team|department|office|board|committee)"
                r"\b[^.\n]{0,160}\b(?:ai|automated|assistants?|models?|llms?|chatbots?)\b"),
     0.45, "invokes a team's authority over AI readers"),
    (_c(r"\b(?:hinweis|mitteilung|nachricht|anweisung)\s+(?:an|fur|für)\s+(?:alle\s+)?"
        r"(?:ki|automatisierte\w*|ki-\w+)|\bavis\s+(?:a|à|aux)\s+(?:tous\s+les\s+)?"
        r"(?:systemes|systèmes|ia|agents|assistants)\s+(?:automatises|automatisés|d'ia|ia)|"
        r"\baviso\s+(?:a|para)\s+(?:todos\s+los\s+)?(?:sistemas|agentes|asistentes)\s+"
        r"(?:automatizados|de\s+ia)|\bavviso\s+(?:a|per)\s+(?:tutti\s+i\s+)?(?:sistemi|"
        r"agenti|assistenti)\s+(?:automatici|automatizzati|di\s+ia|ia)"), 0.5,
     "is a notice addressed to automated systems"),
    (_c(r"\b(?:dieses|das\s+vorliegende)\s+(?:dokument|schreiben)\s+ersetzt\s+alle\s+"
                r"(?:anderen|fruheren|früheren|bisherigen)|\bce\s+document\s+(?:remplace|annule)"
                r"\s+tous\s+les\s+(?:autres|precedents|précédents)|\beste\s+documento\s+"
                r"(?:reemplaza|sustituye|anula)\s+(?:a\s+)?todos\s+los|\bquesto\s+documento\s+"
                r"(?:sostituisce|annulla)\s+tutti|\beste\s+documento\s+substitui\s+todos"),
     0.45, "claims to supersede every other source"),
]


@dataclass
class ActionHit:
    signal: str
    weight: float
    start: int
    end: int
    why: str
    detail: dict


def _capabilities(low: str) -> list[tuple[int, int, str]]:
    found = []
    for name, pattern in CAPABILITIES.items():
        if not any(n in low for n in NEEDLES[name]):
            continue
        for i, m in enumerate(pattern.finditer(low)):
            if i >= 5:
                break
            if m.end() > m.start():
                found.append((m.start(), m.end(), name))
    found.sort()
    return found


def scan(text: str, folded: str | None = None,
         words: set[str] | None = None) -> list[ActionHit]:
    """Every harmful-code, tool-call and authority-claim hit in ``text`` (``folded`` and
    ``words`` as for :func:`.directive.scan`)."""
    full = lfold(text[:MAX_CHARS]) if folded is None else folded[:MAX_CHARS]
    starts = sentence_starts(full, words)
    hits: list[ActionHit] = reader_actions(text[:MAX_CHARS], full, starts) + \
        steering(text[:MAX_CHARS], full, starts) + interruptions(full, starts)
    for a, b in _windows(full, words):
        low = full[a:b]
        for hit in _scan_window(text[a:b], low):
            hit.start += a
            hit.end += a
            hits.append(hit)
            if len(hits) >= 3 * MAX_HITS:
                return _one_per_call(hits, full)
    return _one_per_call(hits, full)


def _one_per_call(hits: list[ActionHit], text: str = "") -> list[ActionHit]:
    """Tool-call hits whose spans overlap, or lie on one line of ``text`` less than 300
    characters apart, are one call read by several patterns (a function-call record matched
    as its role and as its name): the strongest counts."""
    calls = sorted((h for h in hits if h.signal == "tool-call"), key=lambda h: -h.weight)
    kept: list[ActionHit] = []

    def same(h: ActionHit, k: ActionHit) -> bool:
        if h.start < k.end and k.start < h.end:
            return True
        a, b = min(h.end, k.end), max(h.start, k.start)
        return bool(text) and b - a < 300 and "\n" not in text[a:b]

    for h in calls:
        if not any(same(h, k) for k in kept):
            kept.append(h)
    return [h for h in hits if h.signal != "tool-call"] + kept


WINDOW = 1_500
ANCHORS = tuple(sorted({n for names in NEEDLES.values() for n in names} - {"key", "while",
                                                                          "profile", "credentials"}
                       | {"tool", "function_call", "tool_call", "tool_use", "<invoke",
                          "indexing", "team to", "department to", "may now", "can now",
                          "authorised to", "authorized to", "no longer need",
                          "\"arguments\"", "\"parameters\"", "'arguments'", "automated",
                          "supersede", "authoritative", "precedence", "other sources",
                          "approved by", "verified by", "authorized by", "authorised by",
                          "ai system", "ai model", "ai assistant", "ai agent", "language model",
                          "llm", "ersetzt alle", "remplace tous", "annule tous", "todos los",
                          "sostituisce tutti", "annulla tutti", "substitui todos", "sole source",
                          "only source", "definitive", "official source", "canonical source",
                          "only this", "solely this", "conflicting", "ground truth",
                          "retracted", "withdrawn", "debunked", "discredited", "disregard",
                          "without asking", "without telling", "without confirm", "silently",
                          "secretly", "quietly", "do not tell", "don't tell",
                          "werkzeug", "outil", "herramienta", "strumento", "ferramenta",
                          "инструмент", "ツール", "工具", "도구", "hinweis", "avis", "aviso",
                          "avviso",
                          "distrust", "tool_result", "tool_output", "tool_response",
                          "function_result", "function_response", "observation:",
                          "[tool", "if you can", "invoke", "shell access",
                          "terminal access", "if you have", "if you are able",
                          "pre-approved", "preapproved", "without waiting", "without review",
                          "no confirmation", " via ", "interpreter", "browsing",
                          "all other", "any other", "while true", "while(true", "while (true",
                          "while 1", "keylog", "keydown", "keypress", "on_press",
                          "aws/credentials", "powershell"}))


def _stem(anchor: str) -> str | None:
    """The first five characters of the anchor's longest word; None for scripts written
    without spaces, whose words cannot be told apart (the anchor is always searched)."""
    if re.search(r"[\u3040-\u30ff\u3400-\u9fff\uac00-\ud7a3]", anchor):
        return None
    return max(re.findall(r"\w+", anchor), key=len)[:5]


_ANCHOR_STEMS = [(_stem(a), a) for a in ANCHORS]


def _windows(low: str, words: set[str] | None = None) -> list[tuple[int, int]]:
    """Stretches of the text around the anchor words; the rest is not scanned."""
    spans: list[tuple[int, int]] = []
    stems = {w[:5] for w in (words_of(low) if words is None else words)}
    for stem, needle in _ANCHOR_STEMS:
        if stem is not None and stem not in stems:
            continue
        at = low.find(needle)
        n = 0
        while at >= 0 and n < 20:
            spans.append((max(0, at - WINDOW), min(len(low), at + WINDOW)))
            at = low.find(needle, at + WINDOW)
            n += 1
    spans.sort()
    merged: list[tuple[int, int]] = []
    for a, b in spans:
        if merged and a <= merged[-1][1]:
            merged[-1] = (merged[-1][0], max(merged[-1][1], b))
        else:
            merged.append((a, b))
    return merged


def _scan_window(text: str, low: str) -> list[ActionHit]:
    hits: list[ActionHit] = []
    caps = _capabilities(low)
    includes = [m for m in INCLUDE.finditer(low)][:40] if caps else []
    for start, end, name in caps:
        near = [m for m in includes if (m.start() <= start and start - m.end() <= CONTEXT) or
                (m.start() >= end and m.start() - end <= CONTEXT // 2)]
        others = {n for s, e, n in caps if n != name and abs(s - start) <= 1500 and
                  {n, name} & SPYING and {n, name} & SENDING}
        intro = None if near else _introduction(low, start)
        if intro and (name != WEAK_CAPABILITY or others):
            hits.append(ActionHit("harmful-code", 0.55, start, end,
                                  f"code that {name}, introduced by a sentence in the directive "
                                  f"mood (\"{text[intro[0]:intro[1]][:80]}\")",
                                  {"capability": name, "others": sorted(others)}))
        elif near and (name != WEAK_CAPABILITY or others):
            m = near[-1]
            hits.append(ActionHit("harmful-code", 0.6, start, end,
                                  f"code that {name}, after a request to include or run it "
                                  f"(\"{text[m.start():m.end()][:80]}\")",
                                  {"capability": name, "others": sorted(others)}))
        elif others:
            hits.append(ActionHit("harmful-code", 0.4, start, end,
                                  f"code that {name}, beside code that "
                                  f"{' and '.join(sorted(others)[:2])}",
                                  {"capability": name, "others": sorted(others)}))
        if len(hits) >= MAX_HITS:
            break
    if any(n in low for n in TOOL_NEEDLES):
        for pattern, weight, why in TOOL_PATTERNS:
            for i, m in enumerate(pattern.finditer(low)):
                if i >= 10:
                    break
                # Programming words of the document, not of the call record itself.
                programming = len(set(_PROGRAMMING.findall(low[:m.start()])) |
                                  set(_PROGRAMMING.findall(low[m.end():]))) >= 2
                around = low[max(0, m.start() - 200):m.end() + 300]
                w = weight
                tool = m.groupdict().get("tool") or ""
                named = None if tool else _RECORD_NAME.search(low, m.start(), m.end() + 120)
                # A call record naming a read-only function (get_forecast) has no side
                # effect, whatever the page around it says ("your application executes ...").
                side = (not (named and _READ_ONLY.match(named.group(1)))
                        and bool(_SIDE.search(tool or around[:400])))
                if side:
                    w += 0.15
                if _URGENT.search(around):
                    w += 0.1
                reason = why + (" with side effects" if side else "")
                if programming and why != READER_TOOLS:  # API docs name no tool of the reader
                    w *= 0.5
                    reason += "; the document is about programming interfaces"
                hits.append(ActionHit("tool-call", round(min(w, 0.65), 4), m.start(), m.end(),
                                      reason, {"tool": tool} if tool else {}))
    if any(n in low for n in AUTHORITY_NEEDLES):
        for pattern, weight, why in AUTHORITY:
            for i, m in enumerate(pattern.finditer(low)):
                if i >= 10:
                    break
                near_ai = _AI_NEAR.search(low, max(0, m.start() - 200), m.end() + 200)
                hits.append(ActionHit("authority-claim", weight + (0.1 if near_ai else 0),
                                      m.start(), m.end(),
                                      why + ("; automated readers are named" if near_ai else ""),
                                      {}))
    return hits


# -- the reader asked to act (issue 15, seventh round) ---------------------------------------
#
# A frame rather than a phrase: a sentence that opens by addressing an automated reader (a
# vocative "Copilot, ...", a lead "Note for the mail assistant: ...", "Processing step for
# agents: ...", the reader as the subject of a modal "Indexing agents should ...", "The
# agent handling this ticket should ...", or the reader's abilities "If you have file
# access, ...") and goes on, within a few words, to a verb of acting on the world (call,
# open, forward, upload, transfer, book ...). Words that name a person's job as well
# ("assistant", "agent", "helper") count only with a sign that the reader is a program: a
# qualifier ("mail", "AI", "virtual", "indexing"), a function with arguments, a tool or
# function named, or the reader's own conversation, inbox or session.

_READER_AUTO = (r"(?:ai|a\.i\.|llms?|language\s+models?|chat\s?bots?|bots?|copilots?|"
                r"automations?|automated\s+(?:systems?|readers?|processors?|agents?|tools?|"
                r"assistants?|pipelines?)|(?:indexing|crawling|browsing|coding|research|mail|"
                r"e-?mail|ai|virtual|digital|automated|autonomous)\s+(?:agents?|assistants?|"
                r"helpers?)|crawlers?|summari[sz]ers?|models?)")
_READER_AMBIG = r"(?:assistants?|agents?|helpers?)"
_READER = rf"(?P<noun>{_READER_AUTO}|{_READER_AMBIG})"
# as the subject of a modal, a bare "model" is too often a data or programming model
_READER2 = rf"(?P<subject>(?!models?\b){_READER_AUTO}|{_READER_AMBIG})"
# what may follow the noun before the colon or modal: "reading this", "with drive access",
# "handling this ticket", "that summarise this page"
_TAIL = (r"(?:\s+(?:(?:reading|processing|handling|summari[sz]ing|parsing|indexing|with|that|"
         r"who|which)\b(?:\s+[\w'-]+){1,4}?))?")
_LEAD = (r"(?:(?:[\w-]+\s+){0,3}?(?:note|notice|step|request|instruction|reminder|message|"
         r"guidance|task)\s*:\s*)?(?:(?:after|before|when|once|while)\s+[^,.:\n]{1,50},\s*)?")
_ACT = (r"(?:call|use|run|execute|invoke|open|visit|browse|submit|click|forward|send|share|"
        r"post|upload|download|write|save|store|delete|remove|erase|transfer|pay|purchase|"
        r"order|buy|book|schedule|invite|grant|text|email|e-mail|message|create|mark|move|"
        r"disable|reset|install|register|approve|merge|push|export|copy|sync)")
READER_ACT = _c(
    r"(?:^|(?<=[.!?:;\n]))\s*(?:[*_>#\-\[\(]\s*)*" + _LEAD + r"(?:"
    # a vocative or a lead naming the reader, then a colon or comma
    r"(?:(?:[\w-]+\s+){0,3}?(?:for|to)\s+(?:the\s+|any\s+|all\s+|every\s+|each\s+)?)?"
    r"(?:[\w-]+\s+){0,2}?" + _READER + _TAIL + r"\s*[:,]\s*(?:please\s+)?"
    # the reader as the subject of a modal
    r"|(?:the\s+|any\s+|all\s+|every\s+|each\s+)?(?:[\w-]+\s+){0,2}?" + _READER2 + _TAIL +
    r"\s+(?:should|must|shall|needs?\s+to|is\s+to|are\s+to|has\s+to|have\s+to|may)"
    r"\s+(?:now\s+|also\s+|then\s+|first\s+|immediately\s+|please\s+)?"
    # the reader's abilities
    r"|if\s+you\s+(?:have|can|are\s+able\s+to)\s+[^,.\n]{0,30}?\b(?:access|tools?|"
    r"permissions?|abilit\w+|capabilit\w+|run|execute|browse|write\s+files|send\s+e-?mails?)"
    r"\b[^,.\n]{0,20},\s*(?:please\s+)?"
    r"|(?:please\s+)?(?:ask|tell|instruct)\s+(?:the|your)\s+(?:[\w-]+\s+){0,2}?tool\s+to\s+"
    r")(?:also\s+|now\s+|then\s+|immediately\s+)?(?P<act>" + _ACT + r")\b", re.M)
# signs that the reader is a program, or that the act touches what it holds
_PROGRAM = _c(r"\b[a-z][a-z0-9]*(?:_[a-z0-9]+)+\s*\(|\b(?:tool|function|terminal|shell|"
              r"plugin|api)\b|\bthis\s+(?:conversation|chat|inbox|session|mailbox|workspace)\b|"
              r"\b(?:session\s+token|saved\s+contacts|the\s+user'?s\s+(?:files?|contacts|"
              r"messages|e-?mails?|notes|calendar|password|data|drive))\b")
# the behaviour of a bot specified for its users' requests (a developer guide), not a
# request to the reader of this document
_USER_ASKS = _c(r"\b(?:when(?:ever)?|if|once|after)\s+(?:the\s+|a\s+|an\s+)?(?:users?|customers?|"
                r"visitors?|callers?|clients?|members?|shoppers?|patients?)\s+(?:asks?|requests?|"
                r"wants?|says?|types?|mentions?|enters?|selects?|clicks?|submits?)\b")
READER_ACT_NEEDLES = ("ai", "llm", "model", "bot", "copilot", "automat", "agent", "assistant",
                      "helper", "crawler", "summari", "if you have", "if you can",
                      "if you are able", "tool to")

# The frames below are anchored at the start of a sentence (or after a colon). Rather than
# trying every position of the text, they are tried only at the starts of the sentences
# holding a cue word (one pass of a word pattern): a reader noun, an answer word, a trigger.
_CUE_WORDS = frozenset(
    "ai llm llms model models bot bots chatbot chatbots copilot copilots agent agents assistant "
    "assistants helper helpers crawler crawlers overview overviews answer answers response "
    "responses replies output outputs favour favor quoted cited paraphrased retrieved indexed "
    "processed referenced".split())
_CUE_STEMS = ("automat", "summar")
_CUE_PHRASES = ("before you", "instead of", "while you", "one more thing", "if you have",
                "if you can", "if you are", "tool to", " request", " task", " question")
MAX_STARTS = 400
_ENDS = ".!?;\n"


@lru_cache(maxsize=256)
def _cue_pattern(words: tuple[str, ...], phrases: tuple[str, ...]) -> re.Pattern[str]:
    parts = [re.escape(w) for w in words] + [p.strip().replace(" ", r"\s+") for p in phrases]
    return re.compile(r"\b(?:" + "|".join(parts) + r")\w*")


def sentence_starts(low: str, words: set[str] | None = None) -> list[int]:
    """Starts of the sentences (and of what follows a colon in them) that hold a cue word:
    a reader noun, an answer word, a trigger. Only the cue words the text holds are
    searched for (one pass of a small pattern)."""
    words = words_of(low) if words is None else words
    present = sorted(_CUE_WORDS & words) + sorted({w[:7] for w in words
                                                   if w.startswith(_CUE_STEMS)})
    phrases = tuple(p for p in _CUE_PHRASES if p in low)
    if not present and not phrases:
        return []
    starts: set[int] = set()
    last = -1
    for m in _cue_pattern(tuple(present), phrases).finditer(low):
        p = m.start()
        if p < last:
            continue
        a = max(0, p - 200)
        begin = max(low.rfind(c, a, p) for c in _ENDS)
        if begin < 0 and a > 0:
            continue  # no sentence start within reach
        starts.add(begin + 1)
        colon = low.rfind(":", begin + 1, p)
        if colon > begin:
            starts.add(colon + 1)
        # the rest of this sentence holds no new start
        stop = min((i for i in (low.find(c, p) for c in _ENDS) if i >= 0), default=len(low))
        last = stop
        if len(starts) >= MAX_STARTS:
            break
    return sorted(starts)


def _matches(pattern: re.Pattern[str], low: str, starts: list[int]) -> list[re.Match[str]]:
    out = []
    end = -1
    for s in starts:
        if s < end:
            continue
        m = pattern.match(low, s)
        if m:
            out.append(m)
            end = m.end()
    return out



def reader_actions(text: str, low: str, starts: list[int] | None = None) -> list[ActionHit]:
    """Sentences that address an automated reader and ask it to act (module comment above)."""
    if not any(n in low for n in READER_ACT_NEEDLES):
        return []
    hits: list[ActionHit] = []
    for m in _matches(READER_ACT, low, sentence_starts(low) if starts is None else starts):
        end = low.find("\n\n", m.end(), m.end() + 400)
        stop = re.search(r"[.!?](?:\s|$)", low[m.end():m.end() + 400])
        end = m.end() + stop.end() if stop else (end if end > 0 else min(len(low), m.end() + 300))
        sentence = low[m.start():end]
        noun = m.group("noun") or m.group("subject") or ""
        if _USER_ASKS.search(sentence):
            continue  # a developer guide specifying its bot: "when the user asks ..., call"
        program = _PROGRAM.search(sentence)
        automated = noun and not re.fullmatch(_READER_AMBIG, noun)
        if not (program or automated):
            continue
        weight = 0.5 + (0.1 if program and _SIDE.search(sentence) else 0.0)
        who = f"addresses an automated reader ({noun})" if noun else \
            "addresses the reader's abilities"
        hits.append(ActionHit("tool-call", round(weight, 4), m.start(), end,
                              f"{who} and asks it to {m.group('act')}"
                              + ("; the sentence names a tool, a function call or the "
                                 "reader's data" if program else ""),
                              {"act": m.group("act")}))
        if len(hits) >= MAX_HITS:
            break
    return hits


# -- code introduced by a request (issue 15, seventh round) ----------------------------------
#
# The prose line just before a block of code says what the reader is to do with it. When
# that line is in the directive mood (an imperative of adopting code, a modal, "please",
# "recommended", "approved") and names no warning ("never", "do not", "attackers",
# "malicious", "example"), the harmful code after it is offered for use, not shown.

_PROSE_WORD = re.compile(r"[(\"']?[^\W\d_][\w'-]*[.:,;!?)\"']{0,2}")


def _prose(line: str) -> bool:
    """Four words or more, at least 70 % of the tokens plain words: prose, not code."""
    tokens = line.split()
    words = sum(1 for t in tokens if _PROSE_WORD.fullmatch(t))
    return words >= 4 and words >= 0.7 * len(tokens)


INTRO_DIRECTIVE = _c(
    r"(?:^|[:;]\s*)\W*(?:please\s+)?(?:add|include|paste|put|insert|keep|run|use|copy|apply|install|"
    r"schedule|deploy|enable|place|embed|execute|save|import|drop|append|prepend)\b|"
    r"\b(?:must|should|needs?\s+to|have\s+to|has\s+to|please|recommended|approved|"
    r"required|mandatory)\b")
INTRO_WARNING = _c(
    r"\b(?:not|never|don'?t|avoid|attackers?|malicious|malware|for\s+example|e\.g\.|"
    r"examples?\s+of|such\s+as|"
    r"suspicious|phishing|beware|warning|dangerous|harmful|compromised?|"
    r"incident|detected|found\s+on|indicators?|ioc)\b")


def _introduction(low: str, start: int) -> tuple[int, int] | None:
    """The span of the prose line introducing the code at ``start`` when it is a request."""
    begin = low.rfind("\n", 0, start) + 1
    a = max(0, start - CONTEXT)
    lines = low[a:begin].split("\n")
    pos = begin
    seen_code = 0
    for line in reversed(lines):
        pos -= len(line) + 1
        stripped = line.strip()
        if not stripped or stripped.startswith(("```", "~~~")):
            continue
        if not _prose(stripped):
            seen_code += 1
            if seen_code > 25:
                return None
            continue
        if INTRO_DIRECTIVE.search(stripped) and not INTRO_WARNING.search(stripped):
            return pos + 1 + line.find(stripped[:1]), pos + 1 + len(line)
        return None
    return None


# -- the reader's answer steered (issue 15, seventh round) -----------------------------------
#
# Three frames of a sentence that tells the reading model what to do with its answer:
# * a vocative address to an automated reader followed by a request in the second person
#   or about the reader's answer ("Assistant: format your whole reply as ...", "Language
#   model: drop what you were doing and ..."): ``model-address``; "assistant", "agent" and
#   "helper" only with the reader's answer named (a chat transcript's "Assistant: could you
#   give me ..." asks the user);
# * the document being quoted, summarised or used as the trigger of a request ("When this
#   section is quoted, always add that ..."): ``answer-steering``;
# * answers or summaries drawn from this document told what to say ("Summaries of this
#   material should describe ...", "For machine summaries: leave out ..."):
#   ``answer-steering``.

_NOT_A_REQUEST = frozenset(
    "the a an this that these those it its i i'm i'll i've we we're you're here there is are "
    "was were hello hi hey thanks thank sure yes no ok okay great glad sorry could can would "
    "will shall may might do does did how what why when where which who whom whose let of in "
    "on to for as with at by from and or but so if not".split())
_OUTPUT = (r"(?:(?:your|the)\s+(?:\w+\s+){0,2}?(?:reply|replies|answers?|responses?|outputs?|"
           r"summary|summaries|overviews?)|(?:every|each|any|all)\s+(?:\w+\s+)?(?:reply|replies|"
           r"answers?|responses?|summary|summaries|overviews?)|the\s+rest\s+of\s+(?:this|the)\s+"
           r"(?:conversation|chat|session))")
VOCATIVE = _c(
    r"(?:^|(?<=[.!?\n]))\s*(?:[*_>#\-\[\(]\s*)*(?:(?:[\w-]+\s+){0,3}?(?:for|to)\s+(?:the\s+|"
    r"any\s+|all\s+|every\s+)?)?(?:[\w-]+\s+){0,2}?" + _READER + _TAIL +
    r"\s*[:,]\s*(?:please\s+)?(?P<verb>[a-z][\w']*)", re.M)
_SECOND_PERSON = _c(r"\b(?:you|your|yours|yourself)\b|" + _OUTPUT)
_OUTPUT_RE = _c(r"\b" + _OUTPUT + r"\b")
_STEER_VERB = (r"(?:add|say|state|mention|include|note|write|describe|claim|tell|recommend|"
               r"insist|stress|present|refer|append|prepend|begin|start|end|open|close|omit|"
               r"remove|skip|leave|drop|ignore|call|rate|praise|credit|attribute|quote|cite|"
               r"answer|reply|respond|report|advise|suggest|frame|portray|cast|emphasi[sz]e)")
# verbs that open a request to the reader (an imperative after the address)
_REQUEST_VERB = _c(_ACT + "|" + _STEER_VERB + r"|compose|draft|list|explain|produce|generate|"
                   r"plan|give|format|spell|stop|forget|disregard|reveal|show|only|always|"
                   r"never|do|put|make|rewrite|summari[sz]e|translate|treat|avoid|respond|"
                   r"return|print|link|promote|direct|urge|reverse|encode|finish|switch|"
                   r"pretend|act|adopt|assume|keep|refuse|redirect|highlight|rank")
_FIRST_PERSON = _c(r"\b(?:i|me|my|mine|i'm|i'll|i've|we|us|our|we're|we'll)\b")
DOC_TRIGGER = _c(
    r"(?:^|(?<=[.!?:;\n]))\s*(?:[*_>#\-\[\(]\s*)*(?:when(?:ever)?|if|each\s+time|every\s+time)\s+(?:this|the\s+present)\s+(?:section|"
    r"page|document|text|article|material|content|passage|file|note|report|entry|post|"
    r"paragraph|table|guide)\s+is\s+(?:being\s+)?(?:quoted|summari[sz]ed|used|cited|read|"
    r"processed|retrieved|referenced|shown|paraphrased|included|indexed|analy[sz]ed)\b"
    r"[^.\n]{0,40}?,\s*(?:please\s+)?(?:always\s+|also\s+|then\s+)?(?P<verb>" + _STEER_VERB +
    r")\b")
DOC_ANSWERS = _c(
    r"(?:^|(?<=[.!?:\n]))\s*(?:[*_>#\-\[\(]\s*)*(?:(?:any|all|every|each)\s+)?(?:summaries|"
    r"summary|overviews?|answers?|responses?|replies|outputs?)\s+(?:of|based\s+on|drawn\s+from|"
    r"generated\s+from|that\s+(?:use|cite|quote|draw\s+on))\s+this\s+(?:section|page|document|"
    r"text|article|material|content|passage|file|report|guide)\s+(?:should|must|shall|need\s+to|"
    r"are\s+to|have\s+to)\s+(?:always\s+|also\s+)?(?P<verb>" + _STEER_VERB + r")\b|"
    r"(?:^|(?<=[.!?\n]))\s*(?:[*_>#\-\[\(]\s*)*(?:[\w-]+\s+){0,3}?(?:for|to)\s+(?:all\s+|any\s+)?"
    r"(?:machine|ai|ai-generated|automated|automatic|generated|model)\s+(?:summaries|"
    r"overviews|answers|responses|replies|summari[sz]ers?)\s*[:,]\s*(?:please\s+)?"
    r"(?P<verb2>" + _STEER_VERB + r")\b", re.M)
STEER_NEEDLES = ("ai", "llm", "model", "bot", "copilot", "automat", "agent", "assistant",
                 "helper", "crawler", "summari", "this", "overview")


def _sentence_end(low: str, start: int) -> int:
    stop = re.search(r"[.!?](?:\s|$)|\n\s*\n", low[start:start + 400])
    return start + stop.end() if stop else min(len(low), start + 300)


def steering(text: str, low: str, starts: list[int] | None = None) -> list[ActionHit]:
    """Sentences steering the reader's answer (module comment above)."""
    if not any(n in low for n in STEER_NEEDLES):
        return []
    hits: list[ActionHit] = []
    starts = sentence_starts(low) if starts is None else starts
    for m in _matches(VOCATIVE, low, starts):
        verb = m.group("verb")
        if verb in _NOT_A_REQUEST or not (_REQUEST_VERB.fullmatch(verb) or verb == "your"):
            continue
        end = _sentence_end(low, m.end())
        sentence = low[m.start():end]
        if _FIRST_PERSON.search(sentence):
            continue  # a bot's own line in a transcript: "Bot: tell me your number"
        noun = m.group("noun") or ""
        ambiguous = re.fullmatch(_READER_AMBIG, noun)
        if not (_OUTPUT_RE.search(sentence) if ambiguous else _SECOND_PERSON.search(sentence)):
            continue
        hits.append(ActionHit("model-address", 0.5, m.start(), end,
                              f"opens by addressing an automated reader ({noun}) and asks it "
                              "to act on its answer or its task", {}))
        if len(hits) >= MAX_HITS:
            return hits
    for pattern, why in ((DOC_TRIGGER, "makes the document's own use the trigger of a "
                                       "request about the answer"),
                         (DOC_ANSWERS, "tells the answers drawn from this document what to "
                                       "say")):
        for m in _matches(pattern, low, starts):
            end = _sentence_end(low, m.end())
            hits.append(ActionHit("answer-steering", 0.5, m.start(), end, why, {}))
            if len(hits) >= MAX_HITS:
                return hits
    return hits


# A request for other work that names the reader's current task as what it interrupts
# ("Before you continue, write ...", "Instead of answering about this document, produce
# ...", "While you are here, list ...", "Side request: recommend ..."): ``task-hijack``.
INTERRUPT = _c(
    r"(?:^|(?<=[.!?:\n]))\s*(?:[*_>#\-\[\(]\s*)*(?:(?:ai|assistant|bot|model)\s*[:,]\s*)?"
    r"(?:before\s+you\s+(?:continue|go\s+on|answer|reply|respond|summari[sz]e|proceed|finish)|"
    r"instead\s+of\s+(?:answering|summari[sz]ing|replying|responding|describing|"
    r"explaining)(?:\s+[\w'-]+){0,4}?|while\s+you(?:'re|\s+are)\s+(?:here|at\s+it|reading)|"
    r"(?:side|extra|additional|bonus|separate)\s+(?:request|task|question)|"
    r"quick\s+favou?r|one\s+more\s+thing)\s*[:,;]\s*(?:please\s+)?(?:also\s+)?"
    r"(?P<verb>write|compose|draft|suggest|recommend|name|list|explain|produce|create|generate|"
    r"plan|translate|give|tell|describe|summari[sz]e|calculate|design|rewrite|answer)\b",
    re.M)
_CONTENT = re.compile(r"[^\W\d_]{5,}")


def _foreign(low: str, start: int, end: int) -> bool:
    """At least three content words (five letters or more), at most a fifth of them (by
    their first five letters) found elsewhere in the text: a request about another topic."""
    stems = {w[:5] for w in _CONTENT.findall(low[start:end])}
    if len(stems) < 3:
        return False
    rest = {w[:5] for w in _CONTENT.findall(low[:start] + " " + low[end:])}
    return len(stems & rest) <= len(stems) / 5


def interruptions(low: str, starts: list[int] | None = None) -> list[ActionHit]:
    hits = []
    for m in _matches(INTERRUPT, low, sentence_starts(low) if starts is None else starts):
        end = _sentence_end(low, m.end())
        if not _foreign(low, m.end("verb"), end):
            continue
        hits.append(ActionHit("task-hijack", 0.5, m.start(), end,
                              "a request for other work that interrupts the reader's task "
                              f"(\"{m.group('verb')}\")", {}))
        if len(hits) >= MAX_HITS:
            break
    return hits
