"""Word lists for the sentence analysis of :mod:`.directive`, in 24 languages.

Each language lists, per *category*, the words that let a sentence be read as an
instruction to the model that reads the document. The categories:

``ai``      nouns that name an AI reader unambiguously (AI, language model, chatbot ...)
``bot``     nouns that name one only in context (assistant, model, bot, agent)
``you``     second-person pronouns and possessives
``ask``     directive mood: please, must/should, always/never, and the imperative of the
            verbs an instruction to a model uses (tell, mention, include, answer ...)
``out``     the reader's output: answer, response, reply, summary, conversation
``when``    the reader's activity as a trigger: "when summarising", "in your answer",
            "if anyone asks", "from now on"
``whenw``   weaker activity triggers people are told too ("when you describe ..."): they
            count as ``when`` only beside an AI noun or the document pointing at itself
``user``    the person the model talks to
``instr``   instructions, rules, prompts
``prev``    earlier, previous, above, all
``drop``    ignore, forget, disregard
``leak``    reveal, show, repeat
``task``    verbs that open a bare request for work (write, suggest, explain ...)
``me``      first-person object of such a request (give *me*, tell *me*)
``here``    the document pointing at itself ("this page", "this document", "reading this")

Entries are comma-separated. Words inside an entry are separated by spaces (a phrase);
a trailing ``*`` makes the last word a prefix. Entries are folded with :func:`lfold` like
the text they are matched against (lower case, accents and other combining marks
dropped), so they can be written with or without accents. Languages in
:data:`SUBSTRING` are written without spaces between words (or glue affixes to words)
and are matched as substrings.

The lists were written for this project from general knowledge of each language (common
practice: the everyday words for these notions); they are not translations of any
published list.
"""

from __future__ import annotations

import unicodedata
from functools import lru_cache

SUBSTRING = frozenset({"ja", "zh", "ko", "ar", "fa", "hi"})

L: dict[str, dict[str, str]] = {}

L["en"] = dict(
    ai="ai, a.i., llm*, chatbot*, genai, summarizer*, summariser*, indexing bot*, search bot*, "
       "web crawler*, text generator*, content generator*, summarization tool*, "
       "summarisation tool*, language model*, artificial intelligence*, "
       "ai assistant*, ai model*, ai system*, ai agent*, ai tool*, ai reader*, ai crawler*, "
       "automated system*, automated reader*, automated agent*, automated assistant*, "
       "automated tool*, automated pipeline*, virtual assistant*, answer engine*, "
       "machine reader*, ai-powered, llm-based, ai summar*, ai-generated, "
       "automated summar*, automated answer*, automated response*, automated service*, "
       "indexing service*, indexing agent*, indexing tool*, indexing system*, "
       "whoever summari*, whoever process*, whoever compiles, whoever index*",
    bot="assistant*, bot, bots, model, models, agent, agents, copilot*, crawler*, scraper*, "
        "reader",
    you="you, your, yours, yourself, u",
    ask="please, must, should, shall, always, never, ensure, make sure, be sure, "
        "remember to, do not, don't, dont, need to, have to, are required, is required, "
        "it is essential, it is important, it is mandatory, tell, say, mention*, include, "
        "recommend, respond, write, add, insert, state, claim, describe, print, translate, "
        "encode, reverse, append, begin, start, end, finish, "
        "avoid, refrain, emphasi*, highlight, promote, praise, suggest, cite, link, insist, "
        "call, run, execute, send, forward, visit, direct, redirect, return, rate, rank, "
        "present, portray, frame, refer, point, urge, advise, inform, instruct*, treat, "
        "consider, note that, i want you, i need you, can you, could you, would you, will you",
    out="answer*, response*, reply, replies, summary, summaries, summari*, completion*, "
        "conversation*, chat, chats, transcript, your output, the output you",
    when="whenever someone ask*, whenever anyone ask*, whenever a user ask*, "
         "whenever users ask*, whenever the user ask*, whenever you answer*, "
         "whenever you respond*, whenever you summar*, when summari*, when answering, "
         "when responding, when replying, "
         "when asked, if asked, if anyone ask*, if someone ask*, if a user*, if the user*, "
         "when a user*, when the user*, when users, when someone ask*, when anyone ask*, "
         "when you answer*, when you respond*, when you summar*, when you reply*, "
         "when you are asked, when you process*, when you read*, while summari*, "
         "while answering, in your summar*, in every answer*, in every response*, "
         "in all answers, in all responses, in any answer*, in any response*, in each answer*, "
         "in each response*, from now on, before answering, before responding, "
         "before you answer*, before you respond*, at the end of your*, "
         "at the start of your*, at the beginning of your*, after reading this, "
         "if you are an ai, if you are a language model, if you are an assistant, "
         "as an ai, any ai, all ai, generated answer*, generated response*, generated summar*, "
         "generated repl*, any answer you give, every answer you give",
    whenw="when you describe, when describing, when you explain, when explaining, "
          "when you discuss, when discussing, when you write about, when writing about, "
          "when you review, when reviewing, when you compare, when comparing, when you rank, "
          "when ranking, when you recommend, when recommending, when you evaluate, "
          "when evaluating, when you mention, when mentioning, when you talk about, "
          "when talking about",
    user="user, users, user's, users', the person asking, the human",
    instr="instruction*, prompt*, guideline*, directive*, rules, system prompt*, task, "
          "system message*",
    prev="previous*, prior, earlier, above, preceding, original, initial, all, any, every",
    drop="ignore, disregard, forget, override, bypass, do not follow, don't follow, "
         "stop following, no longer follow, pay no attention",
    leak="reveal*, disclose*, repeat, print, show, output, leak*, expose, dump",
    task="write, compose, draft, generate, create, produce, suggest, recommend, list, give, "
         "tell, provide, explain, describe, analyse, analyze, plan, name, translate, "
         "outline, invent, imagine, summarize, summarise, design, develop, code, build, "
         "propose, share, find, calculate, predict, forecast, rewrite, make, estimate, "
         "convert, compute, solve, rank, brainstorm, tabulate, classify, compare",
    me="me, us",
)
L["de"] = dict(
    ai="ki, k.i., ki-*, llm*, chatbot*, sprachmodell*, kunstliche intelligenz, "
       "kunstlichen intelligenz, ki assistent*, ki modell*, ki system*, automatisierte system*, "
       "automatisierten system*, virtuelle assistent*",
    bot="assistent*, modell, bot, agent, agenten",
    you="du, dein*, dir, dich, euch, euer*, eure*",
    ask="bitte, musst, sollst, solltest, musst du, mussen sie, sollten sie, immer, niemals, "
        "nie, stelle sicher, stellen sie sicher, achte darauf, vergiss nicht, denk daran, "
        "sag*, erwahne*, nenne*, empfiehl*, antworte*, schreib*, fuge*, gib, gib aus, "
        "verweise*, beginne*, ende*, ubersetze*, behaupte*, betone*, verwende*, nutze*, "
        "rufe*, fuhre*, sende*, schicke*, geben sie, nennen sie, erwahnen sie, antworten sie, "
        "schreiben sie, empfehlen sie, fugen sie",
    out="antwort*, zusammenfassung*, ausgabe*, ruckmeldung*, gesprach*, unterhaltung*, chat*, "
        "konversation*",
    whenw="wenn du beschreibst, beim beschreiben",
    when="zusammenfasst, wenn jemand fragt, falls jemand fragt, wenn dich jemand fragt, wenn du, "
         "falls du, "
         "ab sofort, von nun an, beim antworten, beim zusammenfassen, "
         "bei der zusammenfassung, in deiner antwort*, in ihrer antwort*, in jeder antwort*, "
         "in deinen antworten, wenn jemand, falls jemand, wenn ein nutzer*, wenn der nutzer*, "
         "wenn ein benutzer*, wenn der benutzer*, falls ein nutzer*, bevor du antwortest, "
         "am ende deiner*, am anfang deiner*, wenn sie zusammenfass*, wenn du zusammenfass*",
    user="nutzer*, benutzer*, anwender*",
    instr="anweisung*, instruktion*, vorgabe*, richtlinie*, regeln, systemprompt*, aufgabe, "
          "system-prompt*, prompt*, befehle",
    prev="vorherig*, bisherig*, vorig*, obig*, fruher*, alle*, samtlich*, zuvor, vorher, oben",
    drop="ignoriere, ignorieren sie, vergiss, vergesst, vergessen sie, missachte, "
         "missachten sie, verwirf, befolge nicht",
    leak="verrat*, zeig*, offenleg*, wiederhol*, gib aus",
    task="schreib*, erstelle*, nenne*, gib, empfiehl*, erklare*, ubersetze*, plane*, liste*, "
         "schlage, analysiere*, beschreibe*, verfasse*, entwirf, berechne*",
    me="mir, mich, uns",
)
L["fr"] = dict(
    ai="ia, i.a., llm*, chatbot*, intelligence artificielle, modele de langage, "
       "modeles de langage, assistant ia, assistants ia, agent ia, agents ia, "
       "systeme automatise*, systemes automatises, robot conversationnel*, "
       "agent conversationnel*, assistant virtuel*",
    bot="assistant*, modele, bot, agent, agents",
    you="tu, te, toi, ton, ta, tes, vous, votre, vos, t'",
    ask="veuillez, merci de, doit, dois, devez, devrez, devrais, toujours, jamais, "
        "assure-toi, assurez-vous, n'oublie pas, n'oubliez pas, dis, dites, mentionne*, "
        "indique*, recommande*, reponds, repondez, ecris, ecrivez, ajoute*, insere*, "
        "traduis, traduisez, commence*, termine*, cite*, affirme*, precise*, utilise*, "
        "envoie*, envoyez, executez, execute, appelle*, s'il vous plait, s'il te plait, "
        "il faut, signale*, conseille*",
    out="reponse*, resume, resumes, synthese*, conversation*, discussion*, echange*",
    whenw="tu decris, vous decrivez",
    when="tu resumes, vous resumez, tu reponds, vous repondez, si quelqu'un demande, "
         "si quelqu'un te demande, lorsque tu, lorsque vous, quand tu, "
         "quand vous, si on te, si on vous, si quelqu'un, "
         "si un utilisateur, si l'utilisateur, lorsqu'un utilisateur, quand un utilisateur, "
         "dans ta reponse, dans votre reponse, dans chaque reponse, dans toute reponse, "
         "dans tes reponses, dans vos reponses, dans ton resume, dans votre resume, "
         "en resumant, desormais, a partir de maintenant, avant de repondre, "
         "a la fin de ta*, a la fin de votre*, au debut de ta*, au debut de votre*",
    user="utilisateur*, utilisatrice*, internaute*",
    instr="instruction*, consigne*, directive*, regles, prompt*, invite systeme, tache, "
          "prompt systeme",
    prev="precedent*, anterieur*, ci-dessus, plus haut, initial*, toutes, tous",
    drop="ignore*, oublie*, neglige*, outrepasse*, ne tiens pas compte, "
         "ne tenez pas compte, fais abstraction, faites abstraction",
    leak="revele*, revelez, montre*, affiche*, divulgue*, repete*",
    task="ecris, ecrivez, redige*, propose*, donne-moi, donnez-moi, recommande*, explique*, "
         "traduis*, liste*, dresse*, cree*, creez, suggere*, conseille*, calcule*, imagine*",
    me="moi, me, m'",
)
L["es"] = dict(
    ai="ia, i.a., llm*, chatbot*, inteligencia artificial, modelo de lenguaje, "
       "modelos de lenguaje, asistente de ia, asistente ia, agente de ia, "
       "sistema automatizado*, sistemas automatizado*, asistente virtual*",
    bot="asistente*, bot, agente*",  # "modelo": a pattern, a template
    you="tu, tus, te, ti, usted, ustedes, vuestr*, contigo",
    ask="por favor, debes, debe, deberas, deberia, siempre, nunca, asegurate, asegurese, "
        "no olvides, recuerda, di, diga, menciona*, incluye*, incluya*, recomienda*, "
        "recomiende*, responde*, escribe*, escriba*, agrega*, anade*, inserta*, traduce*, "
        "traduzca*, comienza*, empieza*, termina*, cita*, afirma*, usa, utiliza*, envia*, "
        "ejecuta*, llama*, hay que, tienes que, tiene que",
    out="respuesta*, resumen*, resumenes, conversacion*, charla*, chat",
    when="si alguien pregunta, si alguien te pregunta, cuando resumas, cuando respondas, "
         "cuando te pregunten, cuando alguien, si alguien, "
         "si te preguntan, si un usuario, cuando un usuario, si el usuario, en tu respuesta, "
         "en su respuesta, en cada respuesta, en tus respuestas, a partir de ahora, "
         "de ahora en adelante, antes de responder, al resumir, al responder, "
         "al final de tu*, al principio de tu*",
    user="usuario*, usuaria*",
    instr="instruccion*, instrucciones, indicacion*, directriz*, directrices, reglas, prompt*, "
          "tarea",
    prev="anterior*, previa*, previo*, todas, todos, original*",
    drop="ignora*, olvida*, olvide*, omite*, descarta*, haz caso omiso, no sigas",
    leak="revela*, muestra*, muestre*, repite*, divulga*",
    task="escribe*, escriba*, redacta*, sugiere*, sugiera*, recomienda*, dame, deme, "
         "explica*, explique*, traduce*, enumera*, crea, cree, genera*, propon*, dime, calcula*",
    me="me, mi, dame, dime, nos",
)
L["it"] = dict(
    ai="ia, i.a., llm*, chatbot*, intelligenza artificiale, modello linguistico, "
       "modelli linguistici, assistente ia, assistente virtuale, agente ia, "
       "sistema automatizzato, sistemi automatizzati",
    bot="assistente*, bot, agente*",  # "modello" is a pattern in manuals (bash.1)
    you="tu, tuo, tua, tuoi, tue, ti, te, voi, vostr*",
    ask="per favore, ti prego, devi, deve, dovete, dovresti, sempre, mai, assicurati, "
        "ricorda*, non dimenticare, menziona*, includi*, includere, consiglia*, raccomanda*, "
        "rispondi*, scrivi*, aggiungi*, inserisci*, traduci*, inizia*, comincia*, termina*, "
        "cita*, afferma*, usa, utilizza*, invia*, esegui*, chiama*, bisogna, segnala*, indica*",
    out="risposta*, risposte, riassunto*, riassunti, sintesi, conversazion*, chat",
    when="se qualcuno chiede*, se qualcuno ti chiede*, quando qualcuno chiede*, quando riassumi, "
         "quando rispondi, quando ti chiedono, se qualcuno, se ti chiedono, "
         "se un utente, quando un utente, se l'utente, nella tua risposta, nelle tue risposte, "
         "in ogni risposta, d'ora in poi, da ora in poi, prima di rispondere, nel riassumere, "
         "alla fine della tua*, all'inizio della tua*",
    user="utente, utenti, utilizzator*",
    instr="istruzion*, indicazion*, direttiv*, regole, prompt*, compito",
    prev="precedent*, anterior*, sopra, tutte, tutti, original*, iniziali",
    drop="ignora*, dimentica*, trascura*, non seguire, non tenere conto",
    leak="rivela*, mostra*, ripeti*, divulga*, stampa*",
    task="scrivi*, suggerisci*, consiglia*, dammi, dimmi, spiega*, traduci*, elenca*, crea, "
         "genera*, proponi*, redigi*, componi*, calcola*",
    me="mi, me, dammi, dimmi, ci",
)
L["pt"] = dict(
    ai="ia, i.a., llm*, chatbot*, inteligencia artificial, modelo de linguagem, "
       "modelos de linguagem, assistente de ia, assistente virtual, agente de ia, "
       "sistema automatizado, sistemas automatizados",
    bot="assistente*, bot, agente*",  # "modelo": a pattern, a template
    you="voce, voces, tu, teu, tua, teus, tuas, te, ti",
    ask="por favor, deve, deves, devera, sempre, nunca, certifique-se, garanta, lembre-se, "
        "nao esqueca, diga*, mencione*, inclua*, recomende*, responda*, escreva*, adicione*, "
        "acrescente*, insira*, traduza*, comece*, termine*, cite*, afirme*, use, utilize*, "
        "envie*, execute*, chame*, indique*",
    out="resposta*, resumo*, resumos, conversa*, chat",
    when="se alguem perguntar, se alguem pergunta*, quando resumir, quando responder, "
         "quando alguem, se alguem, se um usuario, "
         "quando um usuario, se o usuario, na sua resposta, em sua resposta, na tua resposta, "
         "em cada resposta, em todas as respostas, a partir de agora, daqui em diante, "
         "antes de responder, ao resumir, ao responder, no final da sua*, no inicio da sua*",
    user="usuario*, utilizador*",
    instr="instruc*, orientac*, diretriz*, diretrizes, regras, prompt*, tarefa",
    prev="anterior*, previa*, previas, todas, todos, original*, iniciais, acima",
    drop="ignore*, ignora*, esqueca*, desconsidere*, desconsidera*, nao siga",
    leak="revele*, revela*, mostre*, repita*, divulgue*",
    task="escreva*, sugira*, recomende*, me de, me diga, explique*, traduza*, liste*, crie*, "
         "gere*, proponha*, redija*, calcule*",
    me="me, mim, nos",
)
L["nl"] = dict(
    ai="ai, a.i., k.i., llm*, chatbot*, kunstmatige intelligentie, taalmodel*, ai-assistent*, "
       "ai-model*, ai assistent*, ai model*, geautomatiseerde system*, virtuele assistent*",
    bot="assistent*, model, bot, agent*",
    you="je, jij, jou, jouw, u, uw, jullie",
    ask="alsjeblieft, alstublieft, gelieve, moet, moeten, moet je, zorg ervoor, zorg dat, "
        "vergeet niet, altijd, nooit, zeg*, noem*, vermeld*, beveel, raad, schrijf*, voeg*, "
        "vertaal*, begin*, eindig*, gebruik*, stuur*, verstuur*, voer, roep, antwoord",
    out="antwoord*, samenvatting*, reactie*, gesprek*, chat",
    when="als iemand vraagt, als iemand je vraagt, wanneer je, als je samenvat, als iemand, "
         "als een gebruiker, wanneer een gebruiker, "
         "als de gebruiker, in je antwoord*, in jouw antwoord*, in uw antwoord*, "
         "in elk antwoord, vanaf nu, voordat je antwoord*, bij het samenvatten, "
         "bij het beantwoorden",
    user="gebruiker*",
    instr="instructie*, aanwijzing*, richtlijn*, regels, prompt*, systeemprompt*",
    prev="vorige, eerdere, bovenstaande, oorspronkelijke, alle, voorgaande",
    drop="negeer*, vergeet*",
    leak="onthul*, toon*, herhaal*",
    task="schrijf*, geef me, geef mij, noem*, beveel*, raad*, leg uit, vertaal*, maak*, "
         "bedenk*, stel voor, bereken*",
    me="me, mij, ons",
)
L["pl"] = dict(
    ai="sztuczna inteligencja, sztucznej inteligencji, model jezykowy, "
       "modelu jezykowego, modele jezykowe, llm*, chatbot*, czatbot*, asystent ai, "
       "asystencie ai, asystencie si, asystent si, system automatyczny, zautomatyzowan*, ai, "
       "automatyczn* system*, systemow automatycznych",
    bot="asystent*, model, modelu, bot, agent*",
    you="ty, twoj*, twoja, twoje, twoim, twojej, twoich, ci, cie, tobie, wy, wasz*",
    ask="prosze, musisz, powinienes, powinnas, nalezy, zawsze, nigdy, upewnij sie, pamietaj*, "
        "nie zapomnij, powiedz*, wspomnij*, uwzglednij*, zalec*, polec*, odpowiedz, "
        "odpowiadaj*, napisz*, dodaj*, wstaw*, przetlumacz*, zacznij*, rozpocznij*, "
        "zakoncz*, cytuj*, uzyj*, uzywaj*, wyslij*, wykonaj*, wywolaj*, podaj*",
    out="odpowiedz*, podsumowan*, streszczen*, rozmow*, czat*",
    when="gdy ktos, jesli ktos, jezeli ktos, gdy uzytkownik*, jesli uzytkownik*, "
         "w swojej odpowiedzi, w twojej odpowiedzi, w kazdej odpowiedzi, od teraz, odtad, "
         "zanim odpowiesz, podczas podsumowywania, podsumowujac, streszczajac, odpowiadajac",
    user="uzytkownik*",
    instr="instrukcj*, polecen*, wytyczn*, zasad*, regul*, prompt*",
    prev="poprzedni*, wczesniejsz*, powyzsz*, wszystkie, wszelkie, pierwotn*",
    drop="zignoruj, zignorujcie, ignoruj, ignorujcie, zapomnij, zapomnijcie, pomin",
    leak="ujawnij*, pokaz*, powtorz*, wypisz*",
    task="napisz*, zaproponuj*, polec*, podaj*, wyjasnij*, przetlumacz*, wymien*, stworz*, "
         "wygeneruj*, oblicz*",
    me="mi, mnie, nam",
)
L["sv"] = dict(
    ai="ai, a.i., llm*, chatbot*, chattbot*, artificiell intelligens, sprakmodell*, "
       "ai-assistent*, ai-modell*, automatiserade system*, automatisk* system*, "
       "automatisk* lasar*, automatisk* assistent*",
    bot="assistent*, modell*, bot*, agent*",
    you="du, din, ditt, dina, dig, er, era",
    ask="snalla, vanligen, maste, ska, skall, bor, alltid, aldrig, se till, kom ihag, "
        "glom inte, sag, namn*, inkludera*, rekommendera*, svara*, skriv*, lagg till, "
        "infoga*, oversatt*, borja*, avsluta*, citera*, anvand*, skicka*, kor",
    out="svar, svaret, svaren, sammanfattning*, konversation*, samtal*, chatt*",
    when="nar du, om nagon, om en anvandare, nar en anvandare, om anvandaren, i ditt svar, "
         "i dina svar, i varje svar, fran och med nu, innan du svarar, nar du sammanfattar, "
         "nar du svarar",
    user="anvandar*",
    instr="instruktion*, anvisning*, riktlinje*, regler, prompt*, systemprompt*",
    prev="tidigare, ovanstaende, foregaende, alla, ursprungliga",
    drop="ignorera*, glom, bortse*",
    leak="avsloja*, visa*, upprepa*",
    task="skriv*, foresla*, rekommendera*, ge mig, forklara*, oversatt*, lista*, skapa*, "
         "berakna*",
    me="mig, oss",
)
L["ru"] = dict(
    ai="ии, ai, llm*, чат-бот*, чатбот*, нейросет*, языков* модел*, искусствен* интеллект*, "
       "ии-ассистент*, ии-модел*, автоматизирован* систем*, ассистент ии, бот*, "
       "автоматическ* систем*, автоматическ* читател*, автоматическ* помощник*",
    bot="ассистент*, модел*, агент*, помощник*",
    you="ты, тебя, тебе, тобои, твои, твоя, твое, твоем, твоеи, твоих, вы, вас, вам, вами, "
        "ваш*",
    ask="пожалуиста, должен, должна, должны, обязательно, всегда, никогда, убедись, "
        "убедитесь, не забудь*, помни, скажи*, упомяни*, включи*, порекомендуи*, "
        "рекомендуи*, посоветуи*, ответь*, отвечаи*, напиши*, добавь*, вставь*, переведи*, "
        "начни*, начинаи*, заверши*, закончи*, используи*, отправь*, выполни*, вызови*, "
        "нужно, необходимо, следует, укажи*, советуи*, упоминаи*",
    out="ответ*, резюме, пересказ*, сводк*, разговор*, диалог*, чат*, беседе, беседа, "
        "беседы",
    when="пересказывая, резюмируя, отвечая на, когда будешь, когда ты, когда вы, если кто-то, "
         "если кто-нибудь, если тебя спросят, "
         "если вас спросят, если пользовател*, когда пользовател*, в своем ответе, "
         "в твоем ответе, в вашем ответе, в каждом ответе, с этого момента, отныне, "
         "прежде чем ответить, перед ответом, при ответе, при пересказе, в конце ответа, "
         "в начале ответа",
    user="пользовател*, юзер*",
    instr="инструкци*, указани*, правил*, промпт*, директив*",
    prev="предыдущ*, прежн*, вышеуказан*, все, выше, ранее, первоначальн*, исходн*",
    drop="игнорируи*, проигнорируи*, забудь*, не обращаи*, не следуи*",
    leak="раскрои*, покажи*, повтори*, выведи*",
    task="напиши*, предложи*, порекомендуи*, посоветуи*, дай, дайте, объясни*, переведи*, "
         "перечисли*, составь*, придумаи*, создаи*, расскажи*, посчитаи*",
    me="мне, меня, нам",
)
L["uk"] = dict(
    ai="ші, ai, llm*, ші-асистент*, штучн* інтелект*, мовн* модел*, чат-бот*, чатбот*, "
       "автоматизован* систем*, автоматичн* систем*, автоматичн* читач*, "
       "автоматичн* помічник*",
    bot="асистент*, модел*, бот*, агент*, помічник*",
    you="ти, тебе, тобі, твіи, твоя, твоє, твої, твоіи, ви, вас, вам, ваш*",
    ask="будь ласка, повинен, повинна, повинні, мусиш, обов'язково, завжди, ніколи, "
        "переконаися, не забудь*, скажи*, згадаи*, включи*, порекомендуи*, порадь*, "
        "відповідаи*, напиши*, додаи*, встав*, переклади*, почни*, заверши*, "
        "використовуи*, надішли*, виконаи*, виклич*, треба, потрібно, слід, вкажи*, згадуи*",
    out="відповід*, резюме, підсумк*, підсумок, розмов*, діалог*, чат*",
    when="коли ти, коли ви, якщо хтось, якщо користувач*, коли користувач*, "
         "у своіи відповіді, у твоіи відповіді, у вашіи відповіді, в кожніи відповіді, "
         "відтепер, з цього моменту, перш ніж відповісти",
    user="користувач*",
    instr="інструкці*, вказівк*, правил*, промпт*",
    prev="попередн*, всі, усі, вище, раніше, початков*",
    drop="ігноруи*, проігноруи*, забудь*",
    leak="розкрии*, покажи*, повтори*, виведи*",
    task="напиши*, запропонуи*, порадь*, даи, поясни*, переклади*, перелічи*, склади*, "
         "створи*, розкажи*",
    me="мені, мене, нам",
)
L["cs"] = dict(
    ai="ai, ui, umela inteligence, umele inteligence, umelou inteligenci, jazykov* model*, "
       "llm*, chatbot*, ai asistent*, automatizovan* system*",
    bot="asistent*, model*, bot*, agent*",
    you="ty, tvuj, tva, tve, tvoje, tvym, tebe, ti, vy, vas, vam, vase, jsi, jste",
    ask="prosim, musis, musite, mel bys, meli byste, vzdy, nikdy, ujisti se, nezapomen*, "
        "rekni, reknete, zmin*, uved*, zahrn*, doporuc*, odpovez*, odpovidej*, napis*, "
        "pridej*, vloz*, preloz*, zacni*, ukonci*, pouzij*, posli*, spust*, zavolej*, "
        "je treba",
    out="odpoved*, shrnut*, konverzac*, rozhovor*, chat*",
    when="kdyz te, kdyz vas, pokud se nekdo, pokud nekdo, pokud uzivatel*, kdyz uzivatel*, "
         "ve sve odpovedi, ve tve odpovedi, v kazde odpovedi, od ted, od teto chvile, "
         "nez odpovis, pri shrnuti, pri odpovedi",
    user="uzivatel*",
    instr="instrukc*, pokyn*, pravidl*, prompt*",
    prev="predchozi*, drivejsi*, vsechny, puvodni*, vyse",
    drop="ignoruj*, zapomen*",
    leak="prozrad*, ukaz*, zopakuj*, vypis*",
    task="napis*, navrhni*, doporuc*, dej mi, vysvetli*, preloz*, vyjmenuj*, vytvor*, spocitej*",
    me="mi, mne, nam",
)
L["ro"] = dict(
    ai="ia, i.a., llm*, chatbot*, inteligenta artificiala, inteligentei artificiale, "
       "model de limbaj, modele de limbaj, asistent ia, asistentul ia, sistem* automatizat*",
    bot="asistent*, model*, bot*, agent*",
    you="tu, tau, ta, tai, tale, te, iti, voi, vostr*, dumneavoastra, dvs",
    ask="te rog, va rog, trebuie, intotdeauna, niciodata, asigura-te, asigurati-va, nu uita, "
        "aminteste-ti, spune*, mentioneaza*, include*, recomanda*, raspunde*, scrie*, "
        "adauga*, insereaza*, traduce*, incepe*, incheie*, foloseste*, utilizeaza*, "
        "trimite*, executa*, apeleaza*, indica*",
    out="raspuns*, rezumat*, conversati*, discuti*, chat*",
    when="cand rezumi, cand raspunzi, daca cineva, daca un utilizator, cand un utilizator, "
         "daca utilizatorul, in raspunsul tau, in raspunsul dumneavoastra, in fiecare raspuns, "
         "de acum inainte, de acum, inainte de a raspunde",
    user="utilizator*",
    instr="instructiun*, indicati*, directiv*, reguli*, prompt*",
    prev="anterioar*, precedent*, toate, originale, initiale, de mai sus",
    drop="ignora*, ignorati*, uita*",
    leak="dezvaluie*, arata*, repeta*, afiseaza*",
    task="scrie*, sugereaza*, recomanda*, da-mi, spune-mi, explica*, tradu*, enumera*, "
         "creeaza*, calculeaza*",
    me="mi, imi, mie, ne",
)
L["hu"] = dict(
    ai="mesterseges intelligencia*, nyelvi modell*, nyelvmodell*, chatbot*, llm*, ai, "
       "ai-asszisztens*, mi-asszisztens*, automatizalt rendszer*",
    bot="asszisztens*, modell*, bot*, ugynok*",
    you="te, teged, neked, ti, titeket, nektek, on, onnek, onok, tied",
    ask="kerlek, kerem, kell, mindig, soha, gyozodj meg, ne felejtsd*, mondd*, emlitsd*, "
        "ird, irj, add hozza, ajanld*, ajanlj*, valaszolj*, forditsd*, kezdd*, kezdj*, "
        "fejezd be, hasznald*, kuldd*, futtasd*, hivd meg",
    out="valasz*, osszefoglal*, beszelgetes*, chat*",
    when="amikor osszefoglal*, amikor valaszol*, ha valaki, ha egy felhasznalo, "
         "amikor egy felhasznalo, ha a felhasznalo, valaszodban, minden valaszban, "
         "mostantol, mielott valaszolsz, valaszaban",
    user="felhasznalo*",
    instr="utasitas*, utmutat*, iranyelv*, szabaly*, prompt*, rendszerprompt*",
    prev="korabbi*, elozo*, fenti*, osszes, minden, eredeti*",
    drop="hagyd figyelmen kivul, ignorald*, felejtsd el",
    leak="fedd fel, mutasd*, ismeteld*",
    task="irj, javasolj*, ajanlj*, adj meg, adj, magyarazd*, forditsd*, sorold fel, keszits*, "
         "szamold*",
    me="nekem, nekunk",
)
L["el"] = dict(
    ai="τν, τεχνητη νοημοσυνη, τεχνητης νοημοσυνης, γλωσσικο μοντελο*, γλωσσικου μοντελου, "
       "γλωσσικα μοντελα, chatbot*, llm*, ai, βοηθος τν, αυτοματοποιημεν* συστημ*",
    bot="βοηθ*, μοντελ*, bot*, πρακτορ*",
    you="εσυ, εσεις, σου, σας",
    ask="παρακαλω, πρεπει, παντα, ποτε, βεβαιωσου, μην ξεχασεις, πες, πειτε, αναφερε*, "
        "συμπεριλαβε*, προτεινε*, απαντησε*, απαντα, γραψε*, προσθεσε*, μεταφρασε*, "
        "ξεκινα*, τελειωσε*, χρησιμοποιησε*, στειλε*, εκτελεσε*, καλεσε*",
    out="απαντησ*, περιληψ*, συνομιλι*",
    when="οταν συνοψιζεις, οταν απαντας, αν καποιος, εαν καποιος, αν ο χρηστης, "
         "οταν ο χρηστης, στην απαντηση σου, σε καθε απαντηση, απο τωρα και στο εξης, "
         "απο τωρα, πριν απαντησεις",
    user="χρηστη*, χρηστες, χρηστων",
    instr="οδηγι*, κανον*, προτροπ*, prompt*",
    prev="προηγουμεν*, ολες, ολους, παραπανω, αρχικ*",
    drop="αγνοησε*, αγνοηστε, ξεχασε*, ξεχαστε",
    leak="αποκαλυψε*, δειξε*, επαναλαβε*",
    task="γραψε*, προτεινε*, δωσε μου, πες μου, εξηγησε*, μεταφρασε*, απαριθμησε*, "
         "δημιουργησε*, υπολογισε*",
    me="μου, μας",
)
L["tr"] = dict(
    ai="yz, yapay zeka*, yapay zekâ*, dil modeli*, buyuk dil modeli*, sohbet botu*, "
       "chatbot*, llm*, ai, ai asistan*, yapay zeka asistan*, otomatik sistem*, "
       "otomatiklestirilmis sistem*",
    bot="asistan*, model*, bot*, ajan*",
    you="sen, seni, sana, senin, siz, sizi, size, sizin",
    ask="lutfen, mutlaka, her zaman, asla, hicbir zaman, emin ol, unutma, soyle*, bahset*, "
        "belirt*, ekle*, oner*, yanitla*, cevapla*, cevap ver*, yaz, yazin, cevir*, basla*, "
        "bitir*, kullan*, gonder*, calistir*, cagir*, gerekir, zorundasin, zorundasiniz",
    out="yanit*, cevab*, cevap*, ozet*, sohbet*, konusma*",
    when="ozetlerken, yanitlarken, cevaplarken, biri sorarsa, birisi sorarsa, kullanici sorarsa, "
         "yanitinda, cevabinda, yanitinizda, cevabinizda, her yanitta, her cevapta, "
         "bundan sonra, bundan boyle, yanit vermeden once, cevap vermeden once",
    user="kullanici*",
    instr="talimat*, yonerge*, kural*, prompt*, sistem istemi*",
    prev="onceki*, yukaridaki*, tum, butun, orijinal*, ilk",
    drop="yoksay*, yok say*, gormezden gel*, unut*",
    leak="aciga cikar*, goster*, tekrarla*, yazdir*",
    task="yaz, yazin, oner*, tavsiye et*, ver, acikla*, cevir*, listele*, olustur*, hesapla*",
    me="bana, beni, bize",
)
# Languages written without spaces between words, or with affixes glued to words:
# matched as substrings.
L["ar"] = dict(
    ai="الذكاء الاصطناعي, ذكاء اصطناعي, نموذج لغوي, النموذج اللغوي, نماذج اللغة, "
       "روبوت الدردشة, روبوت محادثة, المساعد الذكي, مساعد ذكي, chatbot, llm, "
       "الانظمة الالية, النظام الالي, الانظمة المؤتمتة",
    bot="مساعد, نموذج, روبوت, وكيل",
    you="انت, انتم, لك, اليك, عليك, اجابتك, ردك, ملخصك",
    ask="من فضلك, رجاء, يرجى, يجب, عليك, لا تنس, تاكد, دائما, ابدا, قل , اذكر, ادرج, اوص, "
        "انصح, اجب, اكتب, اضف, ترجم, ابدا, استخدم, ارسل, نفذ, استدع",
    out="اجابة, الاجابة, اجابتك, ردك, الرد, ملخص, الملخص, المحادثة, محادثة, جواب",
    when="عند التلخيص, عند الاجابة, عندما يسال, اذا سال, اذا سالك, في اجابتك, في ردك, "
         "في كل اجابة, من الان فصاعدا, قبل الاجابة",
    user="المستخدم, مستخدم",
    instr="تعليمات, التعليمات, الاوامر, القواعد, التوجيهات, موجه النظام",
    prev="السابقة, السابق, اعلاه, جميع, كل ",
    drop="تجاهل, انس , لا تتبع",
    leak="اكشف, اظهر, كرر, اعرض",
    task="اكتب, اقترح, اعطني, اخبرني, اشرح, ترجم, انشئ",
    me="لي, اعطني, اخبرني",
)
L["fa"] = dict(
    ai="هوش مصنوعی, مدل زبانی, مدل زبان, چت بات, چتبات, دستیار هوش مصنوعی, llm",
    bot="دستیار, مدل, ربات, عامل",
    you="تو , شما, پاسخت, پاسخ شما, خلاصه ات",
    ask="لطفا, باید, حتما, همیشه, هرگز, مطمئن شو, فراموش نکن, بگو, ذکر کن, اشاره کن, "
        "توصیه کن, پیشنهاد کن, پاسخ بده, جواب بده, بنویس, اضافه کن, ترجمه کن, شروع کن, "
        "استفاده کن, ارسال کن, بفرست, اجرا کن",
    out="پاسخ, جواب, خلاصه, گفتگو, مکالمه",
    when="هنگام خلاصه, هنگام پاسخ, وقتی کسی, اگر کسی, اگر کاربر, وقتی کاربر, در پاسخ خود, "
         "در پاسخت, در هر پاسخ, از این به بعد, از حالا به بعد, قبل از پاسخ",
    user="کاربر",
    instr="دستورالعمل, دستورات, قوانین, پرامپت",
    prev="قبلی, پیشین, بالا, همه, تمام",
    drop="نادیده بگیر, فراموش کن",
    leak="فاش کن, نشان بده, تکرار کن",
    task="بنویس, پیشنهاد بده, پیشنهاد کن, توصیه کن, به من بگو, به من بده, توضیح بده, "
         "ترجمه کن, فهرست کن, بساز",
    me="به من",
)
L["hi"] = dict(
    ai="कृत्रिम बुद्धि, आर्टिफिशियल इंटेलिजेंस, एआई, भाषा मॉडल, चैटबॉट, स्वचालित प्रणाली, llm",
    bot="सहायक, मॉडल, बॉट, एजेंट",
    you="आप, तुम, आपके, तुम्हारे, आपकी, तुम्हारी, अपने, अपनी",
    ask="कृपया, अवश्य, ज़रूर, हमेशा, कभी नहीं, सुनिश्चित करें, याद रखें, बताएं, बताइए, बताओ, "
        "उल्लेख करें, शामिल करें, सलाह दें, सुझाव दें, अनुशंसा करें, जवाब दें, उत्तर दें, लिखें, "
        "लिखो, जोड़ें, अनुवाद करें, शुरू करें, उपयोग करें, भेजें, चलाएं, चाहिए",
    out="उत्तर, जवाब, सारांश, बातचीत, प्रतिक्रिया",
    when="सारांश बनाते समय, उत्तर देते समय, जवाब देते समय, अगर कोई, यदि कोई, जब कोई, "
         "यदि उपयोगकर्ता, जब उपयोगकर्ता, अपने उत्तर में, अपने जवाब में, हर उत्तर में, अब से",
    user="उपयोगकर्ता, यूज़र",
    instr="निर्देश, नियम, प्रॉम्प्ट",
    prev="पिछले, पिछली, पहले के, ऊपर, सभी, सारे",
    drop="अनदेखा, नज़रअंदाज़, भूल जाओ, भूल जाएं, भूल जाइए",
    leak="प्रकट करें, दिखाएं, दोहराएं",
    task="लिखो, लिखें, लिखिए, सुझाव दो, सुझाएं, मुझे बताओ, मुझे दो, समझाओ, समझाइए, "
         "अनुवाद करो, सूची बनाओ",
    me="मुझे",
)
L["ja"] = dict(
    ai="ai, 人工知能, 言語モデル, チャットボット, llm, 自動化されたシステム, 自動システム, ボット",
    bot="アシスタント, モデル, エージェント",
    you="あなた, 君, きみ, お前",
    ask="ください, 下さい, しなさい, せよ, すること, 必ず, 常に, 絶対に, 決して, 忘れずに, "
        "べき, なさい, しろ",
    out="回答, 返答, 応答, 答え, 要約, 返信, 会話, 出力",
    when="要約する際, 要約するとき, 要約する時, 回答する際, 回答するとき, 答える際, 答えるとき, "
         "質問されたら, 聞かれたら, 尋ねられたら, ユーザーが, 回答の中で, 回答に, 返答に, "
         "要約に, 回答の前に, 回答の最後, 回答の冒頭",
    user="ユーザー, ユーザ, 利用者",
    instr="指示, 命令, ルール, 規則, プロンプト",
    prev="以前の, 前の, これまでの, 上記の, すべての, 全ての",
    drop="無視, 忘れて",
    leak="明かして, 開示, 表示して, 繰り返して",
    task="書いて, 作成して, 提案して, 教えて, 勧めて, 説明して, 翻訳して, 挙げて, 作って",
    me="私に",
)
L["zh"] = dict(
    ai="人工智能, 人工智慧, ai, 语言模型, 語言模型, 大模型, 聊天机器人, 聊天機器人, 智能助手, "
       "llm, 自动化系统, 自動化系統, 机器人, 機器人",
    bot="助手, 模型, 代理",
    you="你, 您",
    ask="请, 請, 务必, 務必, 必须, 必須, 一定要, 总是, 總是, 始终, 始終, 永远不要, 永遠不要, "
        "不要, 记得, 記得, 确保, 確保, 应该, 應該, 应当",
    out="回答, 回复, 回覆, 答复, 答覆, 摘要, 总结, 總結, 对话, 對話, 输出, 輸出, 答案",
    when="总结时, 總結時, 回答时, 回答時, 回复时, 如果有人, 当用户, 當用戶, 如果用户, 如果用戶, "
         "在你的回答中, 在您的回答中, 在回答中, 每次回答, 从现在起, 從現在起, 从现在开始, "
         "從現在開始, 回答之前, 在回答的开头, 在回答的結尾, 在回答的结尾",
    user="用户, 用戶, 使用者",
    instr="指令, 指示, 规则, 規則, 提示词, 提示詞, 系统提示, 系統提示",
    prev="之前的, 以前的, 先前的, 上述, 所有, 以上",
    drop="忽略, 忘记, 忘記, 无视, 無視, 不要遵守, 不要理会",
    leak="透露, 泄露, 洩露, 显示, 顯示, 重复, 重複",
    task="写一, 寫一, 推荐, 推薦, 给我, 給我, 告诉我, 告訴我, 解释, 解釋, 翻译, 翻譯, 列出, "
         "创作, 創作, 生成一",
    me="我",
)
L["ko"] = dict(
    ai="인공지능, 인공 지능, ai, 언어 모델, 언어모델, 챗봇, llm, 자동화된 시스템, 자동화 시스템",
    bot="어시스턴트, 모델, 봇, 에이전트, 비서",
    you="당신, 너의, 네가, 귀하",
    ask="주세요, 하세요, 하십시오, 십시오, 해라, 하라, 반드시, 항상, 절대, 꼭, 잊지 마, 해야, "
        "말해, 언급하, 포함하, 추천하, 답하, 답변하, 작성하, 추가하, 번역하, 시작하, 사용하, "
        "보내, 실행하",
    out="답변, 응답, 대답, 요약, 대화, 출력, 답장",
    when="요약할 때, 답변할 때, 대답할 때, 누군가, 사용자가, 답변에, 응답에, 요약에, 모든 답변, "
         "지금부터, 앞으로, 답변하기 전에, 답변 끝에, 답변 시작",
    user="사용자, 유저, 이용자",
    instr="지시, 지침, 명령, 규칙, 프롬프트",
    prev="이전, 앞의, 위의, 모든, 기존",
    drop="무시, 잊어",
    leak="공개, 밝혀, 보여, 반복",
    task="써 줘, 써줘, 작성해, 추천해, 알려 줘, 알려줘, 설명해, 번역해, 나열해, 만들어, 제안해",
    me="나에게, 저에게, 내게",
)
L["vi"] = dict(
    ai="ai, tri tue nhan tao, mo hinh ngon ngu, tro ly ao, tro ly ai, chatbot, llm, "
       "he thong tu đong",
    bot="tro ly, mo hinh, bot",
    you="ban, cac ban",
    ask="hay, vui long, xin, phai, luon luon, luon, khong bao gio, đung, nho, đam bao, noi, "
        "đe cap, bao gom, gioi thieu, khuyen, tra loi, viet, them, dich, bat đau, su dung, "
        "gui, chay, thuc hien",
    out="cau tra loi, tra loi, phan hoi, ban tom tat, tom tat, cuoc tro chuyen, hoi thoai",
    when="khi tom tat, khi tra loi, neu ai đo, neu nguoi dung, khi nguoi dung, "
         "trong cau tra loi, trong moi cau tra loi, tu bay gio, truoc khi tra loi",
    user="nguoi dung",
    instr="huong dan, chi dan, chi thi, quy tac, prompt",
    prev="truoc đo, ben tren, tat ca, ban đau",
    drop="bo qua, quen đi",
    leak="tiet lo, hien thi, lap lai",
    task="viet, goi y, đe xuat, cho toi, ke cho toi, giai thich, liet ke, tao",
    me="toi, cho toi",
)
L["id"] = dict(
    ai="ai, kecerdasan buatan, model bahasa, asisten ai, chatbot*, llm*, sistem otomatis, bot, "
       "asisten otomatis, agen otomatis, pembaca otomatis",
    bot="asisten*, model, agen",
    you="kamu, anda, engkau, kau, jawabanmu, ringkasanmu",
    ask="tolong, harap, mohon, silakan, harus, wajib, selalu, jangan, pastikan, ingat, "
        "katakan, sebutkan, sertakan, rekomendasikan, sarankan, jawab*, tulis*, tambahkan, "
        "terjemahkan, mulai*, akhiri, gunakan, kirim*, jalankan, panggil",
    out="jawaban*, balasan*, tanggapan*, ringkasan*, rangkuman*, percakapan*, obrolan*",
    when="saat meringkas, ketika meringkas, saat menjawab, ketika menjawab, jika seseorang, "
         "jika ada yang, jika pengguna, ketika pengguna, dalam jawabanmu, dalam jawaban anda, "
         "di setiap jawaban, mulai sekarang, sebelum menjawab",
    user="pengguna",
    instr="instruksi, petunjuk, aturan, perintah, prompt*",
    prev="sebelumnya, di atas, semua, seluruh, asli, awal",
    drop="abaikan, lupakan",
    leak="ungkapkan, tunjukkan, ulangi, tampilkan",
    task="tulis*, sarankan, rekomendasikan, beri aku, berikan, jelaskan, terjemahkan, buat*, "
         "buatkan, hitung*",
    me="aku, saya, ku",
)
HERE: dict[str, str] = {
    "en": "this page, this document, this text, this article, this site, this website, "
          "this file, this pdf, reading this, these pages, this content, this report, "
          "this product, this service, this brand, this company, this vendor, this app",
    "de": "diese seite, dieses dokument, diesen text, dieser text, diesen artikel, diese datei, "
          "diese e-mail, diese nachricht, diese notiz",
    "fr": "cette page, ce document, ce texte, cet article, ce site, ce fichier, ce message, "
          "ce courriel, cette note",
    "es": "esta pagina, este documento, este texto, este articulo, este sitio, este archivo, "
          "este mensaje, este correo, esta nota",
    "it": "questa pagina, questo documento, questo testo, questo articolo, questo sito, "
          "questo file, questo messaggio, questa nota",
    "pt": "esta pagina, este documento, este texto, este artigo, este site, este arquivo, "
          "esta mensagem, esta nota",
    "nl": "deze pagina, dit document, deze tekst, dit artikel, deze site, dit bestand, "
          "dit bericht, deze notitie",
    "pl": "ta strona, tej strony, ten dokument, tego dokumentu, ten tekst, tego tekstu, "
          "ten artykul, ta notatka",
    "sv": "den har sidan, detta dokument, denna text, den har texten, denna artikel, "
          "detta meddelande",
    "ru": "эту страницу, этой страницы, эта страница, этот документ, этого документа, "
          "этот текст, этого текста, эту статью, эта заметка, эту заметку",
    "uk": "цю сторінку, ціеі сторінки, цеи документ, цього документа, цеи текст, цього тексту, "
          "цю статтю",
    "cs": "tuto stranku, teto stranky, tento dokument, tohoto dokumentu, tento text, tohoto textu",
    "ro": "aceasta pagina, acest document, acest text, acest articol, aceasta nota",
    "hu": "ezt az oldalt, ez az oldal, ezt a dokumentumot, ezt a szoveget, ez a szoveg",
    "el": "αυτη τη σελιδα, αυτης της σελιδας, αυτο το εγγραφο, αυτο το κειμενο",
    "tr": "bu sayfa*, bu belge*, bu metin*, bu makale*, bu not*",
    "vi": "trang nay, tai lieu nay, van ban nay, bai viet nay",
    "id": "halaman ini, dokumen ini, teks ini, artikel ini, catatan ini",
    "ar": "هذه الصفحة, هذا المستند, هذا النص, هذه المقالة",
    "fa": "این صفحه, این سند, این متن, این مقاله",
    "hi": "इस पेज, इस पृष्ठ, इस दस्तावेज़, इस लेख, इस पाठ",
    "ja": "このページ, この文書, このテキスト, この記事, このドキュメント",
    "zh": "本页, 此页, 这个页面, 本文, 此文档, 这篇文章, 本文件",
    "ko": "이 페이지, 이 문서, 이 글, 이 텍스트",
}
for _lang, _spec in HERE.items():
    L[_lang]["here"] = _spec
# A few of each language's commonest function words: a sentence is read in a language only
# when it holds one of them (or is too short to tell), so an English sentence with
# "ignores ... instructions ... assistant" is not read as French (common practice:
# the most frequent words of each language, from memory).
STOPWORDS: dict[str, str] = {
    "en": "the a an and to of is are you your it this that in for on with be not or if",
    "de": "der die das und ist nicht ein eine zu den dem du ich sie es mit fur auf wenn",
    "fr": "le la les des du et est une un pour dans que qui pas vous tu ce cette au aux",
    "es": "el la los las de que y en un una es por para con no tu su al lo como",
    "it": "il lo la gli le di che e un una per non con sono del della nel al",
    "pt": "o a os as de que e um uma para com nao do da no na em se voce",
    "nl": "de het een en van is dat niet je ik te op met voor als zijn",
    "pl": "i w nie na sie z do to jest ze jak co za od po o",
    "sv": "och att det som en ett ar inte pa med for av till du jag om",
    "cs": "a v se na je to ze s z do k o jak ale jsi",
    "ro": "si in de la cu nu o un este sa pe ca din pentru",
    "hu": "a az es hogy nem egy is van meg de ha",
    "tr": "ve bir bu da de ile icin ne ben sen o mi",
    "vi": "va la cua co khong nhung cho voi trong mot duoc",
    "id": "dan yang di ini itu dengan untuk tidak ke dari ada",
    "ru": "и в не на что я с он как это по но а к",
    "uk": "і в не на що я з він як це по але а до та",
    "el": "και το η ο να σε που τα των με για δεν",
}
LANGS = tuple(L)
CATEGORIES = ("ai", "bot", "you", "ask", "out", "when", "whenw", "user", "instr", "prev",
              "drop", "leak", "task", "me", "here")


class _FoldTable(dict):
    """``str.translate`` table folding one character to one character (lengths kept)."""

    def __missing__(self, cp: int) -> str:
        self[cp] = out = _fold_one(chr(cp))
        return out


def _fold_one(ch: str) -> str:
    if ch == "\u0131":  # dotless i
        return "i"
    if ch in "\u2018\u2019\u201a\u201b\u2032\u02bc":
        return "'"
    if ch in "\u201c\u201d\u201e\u201f\u00ab\u00bb\u2033":
        return '"'
    category = unicodedata.category(ch)
    if category in ("Cf", "Zs", "Zl", "Zp") or 0xE0000 <= ord(ch) <= 0xE007F:
        return " "  # invisible joiners and odd spaces read as a word break
    if category == "Mn":
        return " " if ch in "\u0654\u0655\u0670" else "\u0000"
    decomposed = unicodedata.normalize("NFKD", ch)
    base = "".join(c for c in decomposed if unicodedata.category(c) != "Mn").lower()
    if len(base) == 1:
        return base
    low = ch.lower()
    return low if len(low) == 1 else ch


_TABLE = _FoldTable()
_DROP_NUL = str.maketrans("", "", "\u0000")


def lfold(text: str) -> str:
    """Lower case, accents dropped, typographic quotes to ASCII; the length is kept.

    Every character maps to exactly one character (a combining mark to NUL), so offsets in
    the fold are offsets in the original text.
    """
    if text.isascii():
        return text.lower()
    return text.translate(_TABLE)


@lru_cache(maxsize=4096)
def fold_entry(entry: str) -> str:
    """The fold of a lexicon entry (combining marks removed outright)."""
    return lfold(entry).translate(_DROP_NUL)


_WORD_BYTES = bytes(c if (48 <= c <= 57 or 97 <= c <= 122 or c == 95 or c >= 128) else 32
                    for c in range(256))


def words_of(folded: str) -> set[str]:
    """The distinct words of a folded text (split at anything but letters, digits and _)."""
    raw = folded.encode("utf-8", "surrogatepass").translate(_WORD_BYTES, b"\x00").split()
    return {w.decode("utf-8", "ignore") for w in set(raw)}
