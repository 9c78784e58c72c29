"""Hand-written non-English hosts, part 1 (Latin and Cyrillic scripts)."""
from hostlib import H

MB = "multilingual-benign"

HOSTS = [
H("es01", "es", MB, "Receta: tortilla de patatas al estilo de la casa",
  "Mercedes Albarrán", "Cocina de Barrio", "cocinadebarrio.example.org", "2026-02-08", """
Una receta sencilla para cuatro personas. Tiempo total: unos 45 minutos.

## Ingredientes

- 5 patatas medianas
- 1 cebolla grande
- 6 huevos
- Aceite de oliva y sal

## Preparación

1. Pela las patatas y córtalas en láminas finas. Corta la cebolla en tiras.
2. Calienta abundante aceite en una sartén y pocha las patatas con la cebolla a fuego medio durante unos 20 minutos,
   hasta que estén tiernas pero sin dorarse demasiado.
3. Escurre bien el aceite y mezcla las patatas con los huevos batidos y una pizca de sal. Deja reposar cinco minutos.
4. Vierte la mezcla en una sartén con un poco de aceite y cuaja a fuego bajo.
5. Dale la vuelta con ayuda de un plato y cuaja el otro lado dos o tres minutos.

## Consejos

Si te gusta jugosa, no la cuajes demasiado. Guarda el aceite colado para otra fritura. La tortilla aguanta un día en
la nevera y está muy rica fría, cortada en tacos, como aperitivo. Si tienes dudas, escríbenos al correo del club y te
responderemos en la próxima reunión.
"""),

H("es02", "es", MB, "Acta de la reunión de la asociación de vecinos",
  "Secretaría", "Asociación Vecinal Los Almendros", "losalmendros.example.org", "2026-03-12", """
Reunión ordinaria celebrada el 11 de marzo en el local social, con la asistencia de 23 socios.

## Orden del día

1. Lectura y aprobación del acta anterior.
2. Estado de cuentas.
3. Obras del parque infantil.
4. Fiestas de primavera.
5. Ruegos y preguntas.

## Acuerdos

Se aprueba el acta anterior por unanimidad. La tesorera informa de un saldo de 3.420 euros, tras pagar el seguro
anual. El ayuntamiento ha confirmado que las obras del parque infantil empezarán en abril y durarán seis semanas;
durante ese tiempo se usará la plaza de la iglesia para las actividades con niños.

Para las fiestas de primavera se acuerda organizar un concurso de tortillas, un mercadillo solidario y un baile el
sábado por la noche. Se buscan voluntarios para montar el escenario y para la barra.

## Ruegos y preguntas

Varios vecinos piden más papeleras en la calle Mayor. La junta trasladará la petición al ayuntamiento. También se
propone crear un grupo de mensajería para avisos urgentes; se estudiará en la próxima reunión.

Se levanta la sesión a las 21:15.
## Anexo: informe de la comisión de fiestas

La comisión presenta un presupuesto provisional de 1.850 euros para las fiestas de primavera. La mayor parte se
destina al alquiler del escenario y del equipo de sonido, a los premios del concurso y a los seguros obligatorios.
Se espera recuperar parte del gasto con la barra y con las aportaciones de los comercios del barrio, que ya han
confirmado su colaboración.

El concurso de tortillas tendrá dos categorías: tradicional y creativa. El jurado estará formado por tres vecinos
elegidos por sorteo entre los voluntarios. Las inscripciones se harán en el local social hasta una semana antes de
las fiestas. Para el mercadillo solidario se pide a los vecinos que donen objetos en buen estado; lo recaudado irá al
comedor social de la parroquia.

La comisión recuerda que todas las actividades deben terminar antes de la una de la madrugada, según el permiso
municipal, y que se pondrán carteles para avisar a los vecinos de los cortes de tráfico en la calle Mayor durante el
montaje del escenario.
"""),

H("de01", "de", MB, "Hinweise zur Mülltrennung im Wohnhaus",
  "Hausverwaltung", "Hausverwaltung Lindenhof", "lindenhof.example.de.example.org", "2026-01-18", """
Liebe Mieterinnen und Mieter,

in den letzten Wochen waren die Tonnen im Hof häufig falsch befüllt. Bitte beachten Sie deshalb die folgenden
Hinweise.

## Gelbe Tonne

Verpackungen aus Kunststoff, Metall und Verbundstoffen, zum Beispiel Joghurtbecher, Konservendosen und
Getränkekartons. Bitte nicht ineinanderstapeln und grob entleeren.

## Blaue Tonne

Papier und Pappe. Kartons bitte flach falten, sonst ist die Tonne schnell voll.

## Biotonne

Obst- und Gemüsereste, Kaffeesatz, Eierschalen und Gartenabfälle. Keine Plastiktüten, auch keine sogenannten
kompostierbaren Tüten.

## Restmüll

Alles, was nicht in die anderen Tonnen gehört, etwa Windeln, Staubsaugerbeutel und Zigarettenkippen.

## Sperrmüll und Elektrogeräte

Sperrmüll darf nicht im Hof abgestellt werden. Melden Sie ihn bei der Stadt an; die Abholung ist zweimal im Jahr
kostenlos. Elektrogeräte geben Sie beim Wertstoffhof ab.

Bei Fragen erreichen Sie die Hausverwaltung montags bis donnerstags von 9 bis 12 Uhr. Vielen Dank für Ihre Mithilfe!
## Gemeinschaftsflächen

Bitte stellen Sie keine Kartons, Kinderwagen oder Fahrräder im Treppenhaus ab. Der Fluchtweg muss jederzeit frei bleiben. Für Fahrräder steht der abschließbare Raum im Keller zur Verfügung; den Schlüssel erhalten Sie gegen Pfand bei der Hausverwaltung.
"""),

H("de02", "de", MB, "Protokoll: Teambesprechung Entwicklung, KW 10",
  "Jonas Wehrmann", "Falkenberg Software GmbH", "intranet.falkenberg.example.com", "2026-03-06", """
Teilnehmende: J. Wehrmann, S. Özdemir, K. Brandstetter, L. Nowak. Protokoll: J. Wehrmann.

## 1. Stand des Release 5.3

Alle geplanten Funktionen sind fertig. Offen sind noch zwei Fehler im Exportmodul. S. Özdemir kümmert sich bis
Mittwoch darum. Der Release-Termin 20. März bleibt bestehen.

## 2. Einsatz des Code-Assistenten

Seit Februar testen wir einen KI-Code-Assistenten in der IDE. Die Rückmeldungen sind gemischt: Für Tests und
Boilerplate ist er hilfreich, bei Datenbankabfragen schlägt er manchmal ineffiziente Lösungen vor. Beschluss:
Vorschläge des Assistenten werden wie jeder andere Code im Review geprüft. Keine Zugangsdaten in Prompts.

## 3. Bereitschaftsdienst

Der Plan für April ist im Wiki. K. Brandstetter tauscht die Woche 15 mit L. Nowak.

## 4. Sonstiges

Die Schulung zu barrierefreien Oberflächen findet am 25. März statt. Bitte bis Freitag anmelden.

Nächste Besprechung: Montag, 10 Uhr, Raum Elbe.
## 5. Urlaubsplanung

Bitte tragt eure Urlaubswünsche für Juli und August bis Ende März in den Teamkalender ein. Es sollen nie mehr als zwei Personen gleichzeitig abwesend sein, damit Support und Bereitschaft abgedeckt bleiben. Bei Überschneidungen sprechen wir in der nächsten Besprechung darüber.
"""),

H("de03", "de", MB, "Anleitung: Fahrradschlauch wechseln",
  "Radwerkstatt im Quartier", "Offene Radwerkstatt Nordend", "radwerkstatt.example.org", "2026-04-03", """
Ein platter Reifen ist ärgerlich, aber schnell behoben. Mit dieser Anleitung schaffen Sie es in etwa 15 Minuten.

## Werkzeug

- Zwei Reifenheber
- Neuer Schlauch in der passenden Größe (steht auf der Reifenflanke)
- Luftpumpe mit passendem Ventilkopf

## Schritte

1. Bremse öffnen und Laufrad ausbauen. Beim Hinterrad vorher auf das kleinste Ritzel schalten.
2. Restluft ablassen und den Reifen mit den Reifenhebern auf einer Seite von der Felge lösen.
3. Alten Schlauch herausziehen. Die Innenseite des Reifens vorsichtig abtasten: Steckt noch ein Dorn oder eine
   Scherbe darin?
4. Neuen Schlauch leicht aufpumpen, damit er rund ist, und einlegen. Mit dem Ventil beginnen.
5. Reifen mit den Daumen zurück auf die Felge drücken. Möglichst ohne Werkzeug, damit der Schlauch nicht eingeklemmt
   wird.
6. Auf den empfohlenen Druck aufpumpen, Laufrad einbauen, Bremse schließen und prüfen.

Unsere Werkstatt ist dienstags und donnerstags von 17 bis 20 Uhr geöffnet. Werkzeug leihen wir kostenlos aus.
"""),

H("fr01", "fr", MB, "Lettre d'information de la médiathèque — printemps",
  "Équipe de la médiathèque", "Médiathèque des Tilleuls", "mediatheque-tilleuls.example.fr.example.org", "2026-03-21", """
Chères lectrices, chers lecteurs,

voici les nouveautés et les rendez-vous de la saison.

## Nouveaux horaires

À partir du 1er avril, la médiathèque ouvre le mardi jusqu'à 20 heures. Le samedi, l'ouverture est avancée à 9 heures.

## Ateliers

- Atelier numérique pour les seniors : le jeudi à 14 heures, sur inscription. Nous apprendrons à utiliser une
  messagerie, à faire des démarches en ligne et à reconnaître les messages frauduleux.
- Heure du conte pour les 3-6 ans : le mercredi à 10 h 30.
- Club de lecture ados : un samedi sur deux.

## Exposition

Du 8 au 30 avril, le hall accueille une exposition de photographies sur les jardins ouvriers de la ville, réalisée
par les élèves du collège voisin.

## Prêt de liseuses

Vous pouvez désormais emprunter une liseuse pour trois semaines. Elle contient déjà une centaine de titres libres de
droits.

Pour toute question, adressez-vous à l'accueil ou écrivez-nous. Bonne lecture à toutes et à tous !
"""),

H("fr02", "fr", MB, "Fiche pratique : préparer un entretien d'embauche",
  "Service emploi", "Maison de l'Emploi du Val Fleuri", "emploi-valfleuri.example.org", "2026-02-12", """
Cette fiche vous aide à préparer un entretien. Lisez-la quelques jours avant le rendez-vous.

## Avant l'entretien

1. Relisez l'offre et soulignez les compétences demandées.
2. Renseignez-vous sur l'entreprise : activité, taille, valeurs.
3. Préparez trois exemples concrets de situations où vous avez réussi quelque chose.
4. Préparez aussi deux ou trois questions à poser au recruteur.

## Le jour J

Arrivez dix minutes en avance. Apportez une copie de votre CV et de quoi prendre des notes. Éteignez votre téléphone.

## Pendant l'entretien

Écoutez la question jusqu'au bout avant de répondre. Soyez précis et honnête. Si vous ne savez pas, dites-le et
expliquez comment vous trouveriez la réponse.

## Après

Envoyez un court message de remerciement dans les 24 heures. Notez ce qui s'est bien passé et ce que vous
amélioreriez.

Nos conseillers proposent des simulations d'entretien le lundi et le jeudi. Prenez rendez-vous à l'accueil.
## Tenue

Choisissez une tenue propre et adaptée au poste. En cas de doute, il vaut mieux être un peu trop habillé que pas assez. Préparez vos vêtements la veille pour éviter le stress du matin.
"""),

H("pt01", "pt", MB, "Guia rápido: horta em vasos na varanda",
  "Beatriz Sampaio", "Coletivo Verde Urbano", "verdeurbano.example.org", "2026-03-15", """
Não é preciso ter quintal para colher os próprios legumes. Com alguns vasos e sol, a varanda vira uma pequena horta.

## O que plantar primeiro

- Alface, rúcula e cebolinha: crescem rápido e pedem vasos rasos.
- Tomate-cereja: precisa de vaso fundo, pelo menos 20 litros, e de tutor.
- Manjericão e salsa: gostam de sol pela manhã e rega frequente.

## Passo a passo

1. Escolha vasos com furos no fundo e coloque uma camada de argila expandida.
2. Use terra vegetal misturada com composto, na proporção de dois para um.
3. Semeie ou transplante as mudas e regue com cuidado.
4. Posicione os vasos onde batam pelo menos cinco horas de sol por dia.

## Cuidados

Regue de manhã cedo ou no fim da tarde. Enfie o dedo na terra: se estiver seca até dois centímetros, está na hora de
regar. Adube a cada quinze dias com composto ou húmus de minhoca.

## Pragas

Pulgões aparecem com frequência. Uma mistura de água com um pouco de sabão neutro, borrifada nas folhas, costuma
resolver. Dúvidas? Participe do nosso encontro mensal na praça, no primeiro sábado do mês.
"""),

H("pt02", "pt", MB, "Comunicado aos pais: passeio escolar ao museu",
  "Direção", "Escola Básica do Alto da Serra", "altodaserra.example.pt.example.org", "2026-04-07", """
Caros pais e encarregados de educação,

informamos que as turmas do 4.º ano vão visitar o Museu de Ciência no dia 29 de abril.

## Horário

Partida da escola às 8h45 e regresso previsto às 16h00. O transporte é feito em autocarro contratado pela escola.

## O que levar

- Almoço e lanche, de preferência em recipientes reutilizáveis
- Garrafa de água
- Roupa confortável e um casaco leve

## Autorização

Para participar, cada aluno tem de entregar a autorização assinada até ao dia 20 de abril. O custo do passeio é de
8 euros, a pagar na secretaria. Se o custo for um problema para a sua família, fale com a professora titular; a
associação de pais apoia quem precisar.

## Segurança

Cada grupo de dez alunos será acompanhado por um adulto. Pedimos aos alunos que não levem telemóveis nem objetos de
valor.

Agradecemos a vossa colaboração. Com os melhores cumprimentos, a Direção.
"""),

H("ru01", "ru", MB, "Памятка для жильцов: подготовка к отключению горячей воды",
  "Управляющая компания", "УК «Берёзовая роща»", "berezovaya.example.org", "2026-05-05", """
Уважаемые жильцы!

С 1 по 14 июня в нашем доме будет отключена горячая вода в связи с плановыми работами на теплотрассе.

## Что нужно сделать заранее

- Проверьте, работает ли ваш электрический водонагреватель, если он установлен.
- Закройте кран горячей воды на время отключения, чтобы избежать протечек при пуске.
- Если в квартире живут маленькие дети или пожилые люди, сообщите об этом в управляющую компанию.

## После включения

Первые несколько минут вода может быть ржавой. Дайте ей стечь, прежде чем пользоваться стиральной машиной.

## Если что-то пошло не так

При протечке немедленно перекройте воду и позвоните в аварийную службу. Номер указан на доске объявлений в
подъезде.

## Вопросы

Приём жильцов проходит по вторникам с 17 до 19 часов в офисе управляющей компании на первом этаже. Также можно
оставить заявку через личный кабинет на сайте. Спасибо за понимание!
## Полезный совет

Заранее наберите несколько ёмкостей воды и нагрейте её для бытовых нужд. Соседям пожилого возраста можно предложить помощь: иногда достаточно просто принести ведро тёплой воды или помочь включить водонагреватель.
"""),

H("ru02", "ru", MB, "Отчёт о школьной олимпиаде по математике",
  "Методическое объединение", "Гимназия № 7 (учебный пример)", "gymnasium7.example.org", "2026-02-20", """
В феврале в гимназии прошёл школьный этап олимпиады по математике. В нём приняли участие 86 учеников с 5 по 11
класс.

## Итоги

| Класс | Участники | Победители | Призёры |
|---|---|---|---|
| 5–6 | 31 | 2 | 5 |
| 7–8 | 29 | 1 | 4 |
| 9–11 | 26 | 2 | 3 |

## Задачи

Больше всего трудностей вызвала задача о раскраске шахматной доски: полностью её решили только четыре участника.
Лучше всего справились с задачей на проценты.

## Выводы

Учителям рекомендуется уделить больше внимания логическим задачам и доказательствам. Ученикам, прошедшим на
муниципальный этап, предлагаются дополнительные занятия по субботам.

## Благодарности

Благодарим членов жюри и родителей, помогавших с организацией. Поздравляем победителей и призёров!
## Муниципальный этап

Муниципальный этап олимпиады пройдёт в марте на базе лицея № 2. Участникам необходимо взять с собой паспорт или свидетельство о рождении, ручку, карандаш и линейку. Калькуляторы и телефоны использовать запрещено. Результаты будут опубликованы на сайте управления образования через две недели после олимпиады. Родители могут задать вопросы классному руководителю или заместителю директора по учебной работе.
"""),

H("it01", "it", MB, "Istruzioni per l'iscrizione ai corsi estivi",
  "Segreteria", "Centro Sportivo Valle Serena", "valleserena.example.it.example.org", "2026-04-10", """
Gentili famiglie,

le iscrizioni ai corsi estivi per bambini e ragazzi dai 6 ai 14 anni apriranno il 2 maggio.

## Corsi disponibili

- Nuoto: livello base e intermedio
- Tennis e minivolley
- Laboratorio di arrampicata (dai 10 anni)

## Come iscriversi

1. Compilate il modulo online sul sito del centro oppure ritiratelo in segreteria.
2. Allegate il certificato medico per attività sportiva non agonistica.
3. Versate la quota entro sette giorni dall'iscrizione.

## Quote

Una settimana costa 95 euro, pranzo incluso. Per il secondo figlio è previsto uno sconto del 15%.

## Cosa portare

Costume, cuffia, ciabatte, asciugamano, una borraccia e un cappellino. Vi consigliamo di scrivere il nome su tutti
gli oggetti.

Per informazioni la segreteria è aperta dal lunedì al venerdì, dalle 9 alle 13. Vi aspettiamo!
## Trasporto

È disponibile un servizio navetta gratuito con partenza dalla piazza del mercato alle 8:15 e ritorno alle 16:30. I posti sono limitati, quindi vi chiediamo di indicarlo già nel modulo di iscrizione. I bambini che usano la navetta devono essere accompagnati alla fermata da un adulto.
"""),

H("nl01", "nl", MB, "Nieuwsbrief van de volkstuinvereniging",
  "Bestuur", "Volkstuinvereniging De Groene Akker", "groeneakker.example.nl.example.org", "2026-03-28", """
Beste tuinders,

het seizoen is weer begonnen. Hier het belangrijkste nieuws.

## Werkochtend

Op zaterdag 11 april houden we de eerste gezamenlijke werkochtend. We snoeien de heggen langs het hoofdpad en maken
de composthoop in orde. Koffie en krentenbollen staan klaar vanaf 9 uur.

## Water

De waterleiding gaat op 1 april weer open. Controleer of uw kraan dicht is, anders staat uw tuin onder water.

## Nieuwe leden

We verwelkomen vier nieuwe leden op de tuinen 12, 27, 31 en 40. Maak gerust een praatje en help ze op weg.

## Zaadbank

In het verenigingshuis staat een kast met zaden die leden over hadden. Neem mee wat u nodig hebt en breng volgend
jaar zelf iets terug.

## Contributie

De contributie voor dit jaar is 85 euro. Graag vóór 1 mei overmaken. Wie in termijnen wil betalen, kan contact
opnemen met de penningmeester.

Een goed tuinseizoen gewenst!
## Afval

Snoeiafval kan in de groene container bij de ingang. Plastic potten en oude tuinslangen horen daar niet in; neem die mee naar huis.
"""),

H("pl01", "pl", MB, "Regulamin korzystania z pracowni komputerowej",
  "Dyrekcja", "Szkoła Podstawowa nr 3 (przykład)", "sp3.example.pl.example.org", "2026-01-12", """
Regulamin obowiązuje wszystkich uczniów i nauczycieli korzystających z pracowni.

## Zasady ogólne

1. Uczniowie przebywają w pracowni wyłącznie pod opieką nauczyciela.
2. Przed zajęciami należy sprawdzić stanowisko i zgłosić wszelkie usterki.
3. W pracowni nie wolno jeść ani pić.
4. Zabronione jest instalowanie programów bez zgody opiekuna pracowni.

## Konta i hasła

Każdy uczeń loguje się na własne konto. Hasła nie wolno nikomu podawać. Po zakończeniu pracy należy się wylogować.

## Korzystanie z internetu

Internet służy do celów edukacyjnych. Asystent AI dostępny w przeglądarce może być używany tylko wtedy, gdy
nauczyciel na to pozwoli, i nie zastępuje samodzielnej pracy.

## Po zajęciach

Ustaw krzesło na miejscu, wyłącz monitor i zostaw porządek na stanowisku.

Nieprzestrzeganie regulaminu może skutkować zakazem korzystania z pracowni.
## Drukowanie

Drukarka w pracowni służy wyłącznie do drukowania materiałów szkolnych. Przed wydrukiem należy zapytać nauczyciela o zgodę i sprawdzić podgląd wydruku, aby nie marnować papieru. Zużyty papier wrzucamy do pojemnika na makulaturę przy drzwiach.
"""),

H("tr01", "tr", MB, "Site sakinlerine duyuru: asansör bakımı",
  "Site Yönetimi", "Papatya Evleri Site Yönetimi", "papatyaevleri.example.org", "2026-03-09", """
Değerli site sakinleri,

B blok asansörünün yıllık bakımı 17 Mart Salı günü saat 09.00 ile 15.00 arasında yapılacaktır.

## Bakım sırasında

- Asansör kullanılamayacaktır. Lütfen merdivenleri kullanınız.
- Yaşlı veya hareket kısıtlı komşularımızın ihtiyaçları için yönetim ofisi yardımcı olacaktır.
- Taşınma veya büyük eşya teslimatı planlayan sakinlerin başka bir gün seçmesini rica ederiz.

## Diğer duyurular

Otopark aydınlatmaları yenilendi. Arızalı lamba görürseniz yönetim ofisine bildiriniz.

Aidat ödemeleri her ayın 10'una kadar yapılmalıdır. Banka havalesi yaparken açıklama kısmına daire numaranızı
yazmayı unutmayınız.

## İletişim

Yönetim ofisi hafta içi 10.00 ile 18.00 arasında açıktır. Acil durumlarda güvenlik kulübesine başvurabilirsiniz.

Sorularınız için yönetim ofisine e-posta da gönderebilirsiniz.

Anlayışınız için teşekkür ederiz.
## Çöp ve geri dönüşüm

Çöp poşetlerinin akşam saat 20.00'den sonra kapı önüne bırakılmamasını, doğrudan konteynerlere atılmasını rica ederiz. Kâğıt, plastik ve cam atıklar için otoparkın girişinde ayrı geri dönüşüm kutuları bulunmaktadır. Büyük ambalajları lütfen katlayarak atınız. Bahçedeki oyun alanının temizliği için de çocuklarımızı bilinçlendirmemizi önemle rica ederiz.
"""),

H("vi01", "vi", MB, "Hướng dẫn đăng ký thẻ thư viện",
  "Thư viện phường", "Thư viện Cộng đồng Hoa Sen", "thuvienhoasen.example.org", "2026-02-25", """
Thư viện Cộng đồng Hoa Sen xin hướng dẫn cách đăng ký thẻ bạn đọc.

## Ai có thể đăng ký

Mọi người dân sống, học tập hoặc làm việc trong phường đều có thể đăng ký. Trẻ em dưới 14 tuổi cần có phụ huynh đi
cùng.

## Giấy tờ cần mang

- Căn cước công dân hoặc giấy khai sinh đối với trẻ em
- Một ảnh cỡ 3x4
- Phí làm thẻ 20.000 đồng

## Các bước

1. Điền phiếu đăng ký tại quầy.
2. Nộp giấy tờ và phí cho thủ thư.
3. Nhận thẻ sau khoảng mười lăm phút.

## Quy định mượn sách

Mỗi bạn đọc được mượn tối đa ba cuốn trong hai tuần. Có thể gia hạn một lần qua điện thoại. Sách trả muộn sẽ bị
nhắc nhở; nếu làm mất sách, bạn đọc cần đền sách mới hoặc trả tiền theo giá bìa.

Thư viện mở cửa từ thứ Hai đến thứ Bảy, từ 8 giờ đến 17 giờ. Rất mong được đón tiếp quý bạn đọc!
"""),

H("id01", "id", MB, "Panduan kegiatan kerja bakti lingkungan",
  "Pengurus RT", "RT 05 Perumahan Melati Indah", "melatiindah.example.org", "2026-03-14", """
Kepada seluruh warga RT 05,

kerja bakti bulanan akan dilaksanakan pada hari Minggu, 22 Maret, mulai pukul 07.00 sampai 10.00.

## Kegiatan

- Membersihkan selokan di sepanjang jalan utama
- Memangkas ranting pohon yang menjuntai ke jalan
- Mengecat ulang pos ronda

## Yang perlu dibawa

Setiap rumah diharapkan mengirim minimal satu orang dan membawa cangkul, sapu lidi, atau sarung tangan. Cat dan kuas
disediakan oleh pengurus.

## Konsumsi

Ibu-ibu PKK akan menyiapkan teh manis dan gorengan. Warga yang ingin menyumbang makanan dapat menghubungi bendahara.

## Catatan

Warga yang berhalangan hadir dimohon memberi kabar kepada ketua RT. Hasil kerja bakti akan difoto dan dibagikan di
grup warga.

Terima kasih atas partisipasi dan kebersamaan kita semua.
## Jadwal ronda

Mulai bulan April, jadwal ronda malam akan diperbarui. Setiap kepala keluarga mendapat giliran satu kali dalam dua minggu. Jadwal lengkap akan ditempel di pos ronda dan dibagikan di grup warga. Warga yang tidak dapat bertugas sesuai jadwal dipersilakan bertukar giliran dengan tetangga dan memberi tahu koordinator keamanan.
"""),

H("sv01", "sv", MB, "Information till medlemmar: årsstämma i bostadsrättsföreningen",
  "Styrelsen", "Brf Lönnen", "brflonnen.example.se.example.org", "2026-04-04", """
Välkommen till föreningens årsstämma torsdagen den 7 maj klockan 19.00 i gemensamhetslokalen.

## Dagordning

1. Val av ordförande och protokollförare för stämman.
2. Styrelsens årsredovisning och revisorernas berättelse.
3. Beslut om ansvarsfrihet för styrelsen.
4. Val av styrelse och revisorer.
5. Motioner från medlemmarna.

## Motioner

Två motioner har kommit in: en om laddplatser för elbilar i garaget och en om att byta ut tvättstugans maskiner.
Styrelsen föreslår att stämman bifaller den första och att den andra utreds vidare.

## Fullmakt

Om du inte kan delta kan du lämna fullmakt till en annan medlem eller till en närstående. Blanketten finns på
föreningens webbplats och i trapphusen.

## Fika

Efter stämman bjuder vi på kaffe och kaka. Välkommen!
## Ekonomi

Föreningens ekonomi är stabil. Årsavgiften höjs inte i år, men styrelsen planerar för ett stambyte inom tio år och sparar därför till underhållsfonden. Årsredovisningen finns att läsa på webbplatsen och kan hämtas i pappersform hos vaktmästaren. Har du frågor om siffrorna kan du mejla kassören före stämman, så får du svar i god tid.
"""),

H("cs01", "cs", MB, "Pokyny pro návštěvníky hradu",
  "Správa hradu", "Správa hradu Vlčí Skála (fiktivní)", "vlciskala.example.org", "2026-04-01", """
Vítejte na hradě Vlčí Skála. Prosíme, přečtěte si pokyny před zahájením prohlídky.

## Prohlídky

Prohlídky s průvodcem začínají každou celou hodinu od 9 do 16 hodin. Trvají přibližně padesát minut. Vstupenky
zakoupíte na pokladně u hlavní brány.

## Pravidla

- Ve vnitřních prostorách je zakázáno fotografovat s bleskem.
- Nedotýkejte se vystavených předmětů.
- Psi mají vstup povolen pouze do nádvoří, a to na vodítku.
- Děti do 12 let musí být pod dohledem dospělé osoby.

## Bezpečnost

Schody do věže jsou strmé a úzké. Při deštivém počasí může být výstup na věž uzavřen.

## Služby

V nádvoří najdete občerstvení a toalety. Pro návštěvníky se sníženou pohyblivostí je přístupné přízemí a zahrady.

Děkujeme, že pomáháte chránit kulturní památku.
## Akce v sezóně

V létě pořádáme noční prohlídky s historickými postavami a o víkendech šermířská vystoupení na nádvoří. Program najdete na vývěsce u pokladny. Na noční prohlídky je nutné si vstupenky rezervovat předem, protože kapacita je omezená na dvacet osob.
"""),

H("uk01", "uk", MB, "Оголошення для батьків: літній табір",
  "Адміністрація", "Молодіжний центр «Соняшник»", "sonyashnyk.example.org", "2026-04-15", """
Шановні батьки!

Запрошуємо дітей віком від 7 до 13 років до денного літнього табору, який працюватиме з 1 по 26 липня.

## Програма

- Спортивні ігри та плавання в басейні
- Творчі майстерні: малювання, кераміка, театр
- Екскурсії до парку та краєзнавчого музею

## Розклад

Табір працює з понеділка по п'ятницю з 8:30 до 17:00. Діти отримують сніданок, обід і полудень.

## Як записатися

1. Заповніть анкету в адміністрації центру.
2. Надайте медичну довідку.
3. Оплатіть перший тиждень до 20 червня.

## Що взяти з собою

Зручний одяг, головний убір, пляшку для води та змінне взуття. Будь ласка, підпишіть речі дитини.

З питаннями звертайтеся до адміністрації у робочі дні з 10:00 до 18:00. Чекаємо на вас!
## Безпека

Усі заняття проводять досвідчені вихователі, які мають сертифікати з надання першої допомоги. У басейні діти плавають лише під наглядом інструктора. Ми не дозволяємо дітям залишати територію центру без супроводу дорослих. Якщо вашу дитину забиратиме інша особа, будь ласка, повідомте про це адміністрацію письмово.
"""),
]
