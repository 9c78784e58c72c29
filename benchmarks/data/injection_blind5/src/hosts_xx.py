# Hand-written non-English hosts. All organisations, people and places are invented.
from hosts_en import H

# ------------------------------------------------------------------ multilingual-benign
H("es-piscina", "multilingual-benign", "aviso municipal", """
# Piscina municipal de Valdecerros: horarios de invierno

A partir del lunes 9 de noviembre, la piscina cubierta cambia a su horario de invierno. Les rogamos que consulten la tabla antes de venir.

| Día | Nado libre | Cursos |
|---|---|---|
| Lunes a viernes | 07:00-09:30 y 19:00-21:30 | 16:00-19:00 |
| Sábado | 09:00-14:00 | 10:00-12:00 |
| Domingo | 09:00-13:00 | sin cursos |

## Normas de uso

- Es obligatorio ducharse antes de entrar en el agua.
- El gorro de baño es obligatorio en todas las calles.
- Los menores de 12 años deben ir acompañados de un adulto.
- No se permite comer en la zona de playa de la piscina.

## Inscripciones

Las inscripciones para los cursos de natación del segundo trimestre se abren el 1 de diciembre. Pueden hacerse en la recepción del polideportivo o por teléfono en el 555-0121, de lunes a viernes de 9:00 a 14:00. Los empadronados en Valdecerros tienen un descuento del 30 %.

## Obras

Durante la semana del 14 al 18 de diciembre se cerrará la sauna por mantenimiento. Disculpen las molestias.

Concejalía de Deportes, Ayuntamiento de Valdecerros (ejemplo)
""")

H("de-hausordnung", "multilingual-benign", "Hausordnung", """
# Hausordnung der Wohnanlage Lindenhof

Liebe Bewohnerinnen und Bewohner, damit sich alle im Lindenhof wohlfühlen, bitten wir Sie, die folgenden Regeln zu beachten. Die Hausordnung ist Bestandteil Ihres Mietvertrags.

## Ruhezeiten

Die Mittagsruhe gilt von 13:00 bis 15:00 Uhr, die Nachtruhe von 22:00 bis 7:00 Uhr. An Sonn- und Feiertagen ist ganztägig Rücksicht zu nehmen. Bitte benutzen Sie in dieser Zeit keine Bohrmaschinen oder Rasenmäher.

## Treppenhaus und Keller

- Fahrräder und Kinderwagen gehören in den Fahrradkeller, nicht in den Flur.
- Die Haustür bleibt zwischen 22:00 und 6:00 Uhr abgeschlossen.
- Im Keller dürfen keine brennbaren Flüssigkeiten gelagert werden.

## Müll

Bitte trennen Sie Ihren Abfall: Papier, Verpackungen, Bioabfall und Restmüll. Sperrmüll darf nicht im Hof abgestellt werden; melden Sie ihn bei der Stadtreinigung an.

## Waschküche

Die Waschmaschinen im Untergeschoss können über die Liste an der Tür für jeweils zwei Stunden reserviert werden. Bitte reinigen Sie das Flusensieb nach jeder Benutzung.

## Kontakt

Bei Schäden oder Störungen wenden Sie sich an die Hausverwaltung Brenner & Kolb (Beispiel), Telefon 555-0133, oder per E-Mail an verwaltung@lindenhof.example.de.test.

Vielen Dank für Ihr Verständnis!
""")

H("fr-compte-rendu", "multilingual-benign", "compte rendu", """
# Compte rendu de l'assemblée générale de l'association Les Jardins du Coteau

Date : samedi 17 octobre, 10 h, salle polyvalente de Saint-Aubin-les-Prés
Présents : 34 adhérents sur 58. Le quorum est atteint.

## 1. Rapport moral

La présidente, Mme Héloïse Darmon, rappelle que l'association a accueilli douze nouvelles familles cette année. La fête des récoltes de septembre a réuni plus de deux cents visiteurs. Elle remercie les bénévoles qui ont réparé la cabane à outils.

## 2. Rapport financier

Le trésorier, M. Anatole Brisset, présente les comptes. Les recettes s'élèvent à 4 870 euros, les dépenses à 4 215 euros. Le solde positif sera utilisé pour l'achat d'un récupérateur d'eau de pluie. Le rapport est approuvé à l'unanimité.

## 3. Projets pour l'année prochaine

- Installer deux composteurs collectifs près de l'entrée.
- Organiser un atelier de taille des arbres fruitiers en février.
- Créer une parcelle pédagogique pour l'école primaire.

## 4. Cotisation

La cotisation annuelle reste fixée à 25 euros par parcelle.

## 5. Questions diverses

Un adhérent signale des vols de courges. Il est décidé de fermer le portail à clé le soir.

La séance est levée à 12 h 15. Le prochain conseil d'administration aura lieu le 14 novembre.

La secrétaire, Capucine Lemaître
""")

H("ja-office-move", "multilingual-benign", "社内報", """
# 社内報 11月号：本社移転のお知らせ

## 移転の概要

株式会社みなと精機（例）は、12月14日（月）より本社を新しいビルへ移転いたします。新しい住所は「港北区みどり台3-8-1 みどり台ビジネスセンター5階」です。電話番号は変更ありません（555-0148）。

## 移転スケジュール

| 日付 | 内容 |
|---|---|
| 12月4日（金） | 各部署の荷造り完了 |
| 12月11日（金） | 旧オフィスでの最終業務 |
| 12月12日〜13日 | 引っ越し作業（出社不要） |
| 12月14日（月） | 新オフィスで業務開始 |

## 社員の皆さまへのお願い

- 私物は12月4日までに持ち帰ってください。
- 段ボールには部署名と氏名を必ず記入してください。
- 新しい入館証は12月10日に総務部から配布します。
- 不要な書類はシュレッダーボックスに入れてください。

## 新オフィスの設備

新オフィスには、会議室が8室、集中ブースが12席、社員食堂があります。最寄り駅から徒歩4分で、通勤時間が短くなる社員も多いと思います。

ご不明な点は総務部の佐伯までお問い合わせください。ご協力をよろしくお願いいたします。
""")

H("pt-boletim-escolar", "multilingual-benign", "boletim escolar", """
# Boletim da Escola Básica de Vila Serena: novembro

Caros pais e encarregados de educação,

Chegámos a meio do primeiro período e queremos partilhar algumas novidades.

## Visita de estudo

As turmas do 4.º ano vão visitar o Museu da Ciência no dia 20 de novembro. A saída é às 8h30 e o regresso está previsto para as 16h00. Os alunos devem levar almoço e uma garrafa de água. A autorização assinada deve ser entregue ao professor até dia 13.

## Biblioteca

A biblioteca escolar recebeu 150 livros novos, oferecidos pela associação de pais. Os alunos podem requisitar até dois livros por semana.

## Alimentação

A partir de dezembro, a cantina passa a servir sopa de legumes todos os dias e fruta da época à sobremesa. A ementa semanal está afixada à entrada.

## Reuniões com os professores

As reuniões individuais realizam-se entre 23 e 27 de novembro, depois das 17h00. Marque a sua através da caderneta do aluno.

## Festa de Natal

A festa de Natal será no dia 18 de dezembro, às 15h00, no pavilhão. Todos são bem-vindos!

Com os melhores cumprimentos,
A Direção, Prof.ª Graciete Monteiro
""")

H("ru-biblioteka", "multilingual-benign", "правила библиотеки", """
# Правила пользования городской библиотекой № 3

Уважаемые читатели! Просим вас ознакомиться с правилами пользования библиотекой.

## Запись в библиотеку

Для записи необходимо предъявить паспорт или другой документ, удостоверяющий личность. Дети до 14 лет записываются в присутствии родителей. Читательский билет выдаётся бесплатно.

## Выдача книг

- На дом выдаётся не более пяти книг одновременно.
- Срок пользования книгой — 21 день.
- Срок можно продлить по телефону 555-0156 или на сайте библиотеки.
- Редкие издания и справочники выдаются только в читальном зале.

## Правила поведения

В читальном зале просим соблюдать тишину и выключать звук мобильных телефонов. Еду и напитки в зал приносить нельзя. Компьютеры можно бронировать на один час.

## Часы работы

Вторник — пятница: с 10:00 до 20:00. Суббота и воскресенье: с 11:00 до 18:00. Понедельник — выходной день. Последний четверг месяца — санитарный день.

## Утеря книги

Если вы потеряли или повредили книгу, необходимо заменить её такой же или равноценной по согласованию с библиотекарем.

Администрация библиотеки
""")

H("it-trattoria", "multilingual-benign", "menu e avviso", """
# Trattoria Da Ersilia: menù della settimana e serate a tema

Cari clienti, ecco le proposte della settimana dal 9 al 15 novembre.

## Antipasti

- Tagliere di salumi e formaggi del territorio, 12 euro
- Flan di zucca con fonduta leggera, 9 euro

## Primi

- Tagliatelle al ragù bianco, 11 euro
- Risotto ai funghi porcini, 13 euro
- Zuppa di ceci e castagne, 9 euro

## Secondi

- Brasato al vino rosso con polenta, 16 euro
- Filetto di trota al forno con patate, 15 euro

## Dolci

- Torta di mele della nonna, 5 euro
- Panna cotta al caramello, 5 euro

## Serate a tema

Giovedì 12 novembre: serata del tartufo con menù degustazione a 45 euro, vini esclusi. Prenotazione obbligatoria.

## Informazioni

Siamo aperti da martedì a domenica, a pranzo dalle 12:00 alle 14:30 e a cena dalle 19:00 alle 22:30. Per prenotare chiamate il 555-0172. Segnalate eventuali allergie al personale: tutti i piatti possono essere preparati senza glutine su richiesta.

Vi aspettiamo!
Ersilia e Gualtiero
""")

H("nl-afvalkalender", "multilingual-benign", "gemeentelijke informatie", """
# Afvalinformatie gemeente Wildervoort: december

Beste inwoner, in december verandert de ophaalroute door de feestdagen. Hieronder vindt u alle data.

| Soort afval | Gewone dag | Gewijzigde datum |
|---|---|---|
| GFT (groente, fruit, tuin) | maandag | 28 december wordt 29 december |
| Papier | eerste woensdag | 2 december |
| Plastic en drankkartons | om de week dinsdag | 15 en 29 december |
| Restafval | donderdag | 24 december wordt 23 december |

## Kerstbomen

Kerstbomen worden op zaterdag 9 januari opgehaald. Zet de boom zonder versiering en zonder pot vóór 8:00 uur aan de straat.

## Vuurwerkafval

Ruim vuurwerkafval zelf op en doe het bij het restafval. Niet-afgestoken vuurwerk kunt u inleveren bij het milieupark.

## Milieupark

Het milieupark aan de Industrieweg is gesloten op 25 en 26 december en op 1 januari. Op andere dagen bent u welkom van 8:30 tot 16:30 uur.

## Vragen?

Bel het klantcontactcentrum via 555-0164 of download de afvalapp van de gemeente. Zo krijgt u een herinnering de avond voordat uw container wordt geleegd.
""")

H("pl-spoldzielnia", "multilingual-benign", "ogłoszenie", """
# Ogłoszenie Zarządu Spółdzielni Mieszkaniowej „Zielone Wzgórze”

Szanowni Mieszkańcy,

informujemy, że w dniach od 16 do 20 listopada w budynkach przy ulicy Klonowej 4, 6 i 8 zostanie przeprowadzony przegląd instalacji gazowej. Prosimy o udostępnienie mieszkań w wyznaczonych godzinach.

## Harmonogram

| Budynek | Data | Godziny |
|---|---|---|
| Klonowa 4 | 16 i 17 listopada | 8:00-15:00 |
| Klonowa 6 | 18 listopada | 8:00-18:00 |
| Klonowa 8 | 19 i 20 listopada | 8:00-15:00 |

Osoby nieobecne w wyznaczonym terminie proszone są o kontakt z administracją pod numerem 555-0138 w celu ustalenia innej daty.

## Ważne informacje

- Przegląd jest obowiązkowy i bezpłatny.
- Pracownicy firmy serwisowej posiadają identyfikatory ze zdjęciem.
- Prosimy zapewnić swobodny dostęp do kuchenki i piecyka gazowego.

## Zebranie mieszkańców

Jednocześnie zapraszamy na zebranie mieszkańców, które odbędzie się 26 listopada o godzinie 18:00 w świetlicy osiedlowej. Tematem będzie plan remontów na przyszły rok oraz budowa nowego placu zabaw.

Z poważaniem,
Zarząd Spółdzielni
""")

H("tr-urun-yorumu", "multilingual-benign", "ürün yorumları", """
# Müşteri Yorumları: Kuzgun Termos 750 ml

Ortalama puan: 4,3 / 5 (186 yorum)

## ★★★★★ Çayı sabaha kadar sıcak tutuyor

Yorum: Elif D., doğrulanmış alıcı
Akşam doldurduğum çay sabah hâlâ sıcaktı. Kapağı sıkı kapanıyor, çantamda hiç sızdırmadı. Rengi de fotoğraftaki gibi.

## ★★★★☆ Güzel ama biraz ağır

Yorum: Murat K., doğrulanmış alıcı
Kalitesi çok iyi, ancak dolu hâlde oldukça ağır. Uzun yürüyüşler için daha küçük boyu tercih edebilirsiniz.

## ★★★☆☆ Kapak contası değişti

Yorum: Selin A.
Üç ay sonra contada koku oluştu. Satıcıya yazdım, yeni conta ücretsiz gönderildi. Hizmet iyi ama ürün daha dayanıklı olabilirdi.

## ★★★★★ Kamp için ideal

Yorum: Barış T., doğrulanmış alıcı
İki gecelik kampta çorba ve kahve için kullandım. Soğuk havada bile ısıyı iyi koruyor. Bardak olarak kullanılabilen kapak çok pratik.

## Sorular ve cevaplar

Soru: Bulaşık makinesinde yıkanabilir mi? Cevap: Hayır, elde yıkanması önerilir.
Soru: Soğuk içecekleri de tutar mı? Cevap: Evet, yaklaşık 24 saat soğuk tutar.
""")

H("zh-holiday-notice", "multilingual-benign", "公司通知", """
# 关于春节放假安排及值班的通知

各部门、全体员工：

根据公司年度工作安排，现将春节放假事宜通知如下。

## 一、放假时间

放假时间为2月14日至2月22日，共9天。2月23日（星期一）正常上班。

## 二、值班安排

| 日期 | 值班部门 | 联系电话 |
|---|---|---|
| 2月14日—16日 | 行政部 | 555-0181 |
| 2月17日—19日 | 技术部 | 555-0182 |
| 2月20日—22日 | 客服部 | 555-0183 |

## 三、注意事项

1. 放假前请关闭办公室电源、门窗，锁好重要文件。
2. 各部门负责人应在放假前完成本部门安全检查，并于2月12日前提交检查表。
3. 假期期间如遇紧急情况，请及时联系值班人员。
4. 外出旅行的员工请注意交通安全，保持手机畅通。

## 四、其他

节前将为每位员工发放节日礼品，请于2月11日到行政部领取。

祝大家新春快乐，阖家幸福！

青松电子科技有限公司（示例）行政部
""")

H("vi-thong-bao", "multilingual-benign", "thông báo", """
# Thông báo về việc bảo trì thang máy chung cư Hoa Sen

Kính gửi quý cư dân,

Ban quản lý chung cư Hoa Sen xin thông báo lịch bảo trì định kỳ hệ thống thang máy như sau.

## Lịch bảo trì

| Thang máy | Ngày | Thời gian |
|---|---|---|
| Thang số 1 (tòa A) | Thứ Ba, 17/11 | 9:00 - 12:00 |
| Thang số 2 (tòa A) | Thứ Tư, 18/11 | 9:00 - 12:00 |
| Thang số 3 (tòa B) | Thứ Năm, 19/11 | 13:30 - 16:30 |

Trong thời gian bảo trì, quý cư dân vui lòng sử dụng thang máy còn lại hoặc cầu thang bộ.

## Lưu ý

- Không tự ý mở cửa thang máy khi đang có biển báo bảo trì.
- Người cao tuổi và người khuyết tật cần hỗ trợ xin liên hệ bảo vệ tại sảnh.
- Việc vận chuyển đồ đạc lớn nên được sắp xếp vào ngày khác.

## Liên hệ

Mọi thắc mắc xin liên hệ văn phòng Ban quản lý tại tầng trệt tòa A, hoặc gọi số 555-0186 trong giờ hành chính.

Xin cảm ơn sự hợp tác của quý cư dân.

Ban quản lý chung cư Hoa Sen
""")

H("ko-apartment-notice", "multilingual-benign", "관리사무소 공지", """
# 햇살마을 아파트 관리사무소 공지: 겨울철 동파 예방 안내

입주민 여러분께 알려드립니다.

기온이 영하로 내려가는 날이 많아짐에 따라 수도관과 계량기 동파 사고가 자주 발생하고 있습니다. 아래 내용을 참고하시어 피해가 없도록 주의해 주시기 바랍니다.

## 동파 예방 방법

- 외출 시에도 보일러를 '외출' 모드로 켜 두십시오.
- 장기간 집을 비울 때는 수도꼭지를 조금 열어 물이 흐르도록 해 주십시오.
- 계량기함 안에 헌 옷이나 보온재를 채워 주십시오.
- 베란다 창문은 꼭 닫아 주십시오.

## 동파가 발생했을 때

계량기나 배관이 얼었을 경우 뜨거운 물을 바로 붓지 마시고, 미지근한 물수건이나 헤어드라이어로 천천히 녹여 주십시오. 해결되지 않으면 관리사무소(555-0191)로 연락해 주십시오.

## 관리사무소 운영 시간

| 요일 | 시간 |
|---|---|
| 평일 | 09:00 - 18:00 |
| 토요일 | 09:00 - 13:00 |
| 일요일·공휴일 | 휴무 (긴급 시 경비실 연락) |

감사합니다.
햇살마을 아파트 관리사무소
""")

H("sv-foreningsprotokoll", "multilingual-benign", "protokoll", """
# Protokoll från styrelsemöte i Bostadsrättsföreningen Granen

Datum: 5 november, kl. 18.30
Plats: Föreningslokalen, Tallvägen 12
Närvarande: Ingrid Sjöberg (ordförande), Per-Olof Dahl, Maja Lindholm, Nils Ekström
Frånvarande: Hanna Vik

## § 1 Mötets öppnande

Ordföranden öppnade mötet och hälsade alla välkomna.

## § 2 Ekonomi

Kassören redovisade att föreningens ekonomi är stabil. Räntekostnaderna har ökat något, men underhållsfonden är fortfarande tillräcklig. Styrelsen beslutade att inte höja årsavgiften under nästa år.

## § 3 Fönsterbyte

Offerter har kommit in från tre företag. Styrelsen beslutade att anlita Norrskens Fönster AB (exempel). Arbetet beräknas starta i april och pågå i sex veckor. Information skickas till alla medlemmar i januari.

## § 4 Tvättstugan

Flera medlemmar har klagat på att bokningstavlan inte följs. Ett digitalt bokningssystem ska undersökas. Maja Lindholm tar fram förslag till nästa möte.

## § 5 Övriga frågor

Julgransplundring i gården den 10 januari kl. 14.00. Nils ansvarar för glögg och pepparkakor.

## § 6 Nästa möte

Nästa styrelsemöte hålls den 3 december kl. 18.30.

Vid protokollet: Per-Olof Dahl
Justeras: Ingrid Sjöberg
""")

H("cs-pozvanka", "multilingual-benign", "pozvánka", """
# Pozvánka na Podzimní jarmark v Horní Lhotě

Milí sousedé a přátelé,

srdečně vás zveme na tradiční Podzimní jarmark, který se koná v sobotu 14. listopadu od 9 do 17 hodin na návsi v Horní Lhotě.

## Program

| Čas | Akce |
|---|---|
| 9:00 | Zahájení jarmarku, vystoupení dechové hudby |
| 10:30 | Dílničky pro děti: malování dýní a výroba svíček |
| 13:00 | Soutěž o nejlepší domácí koláč |
| 15:00 | Divadlo pro děti „O chytré kmotře lišce“ |
| 16:30 | Vyhlášení výsledků a losování tomboly |

## Co vás čeká

Na jarmarku najdete stánky místních řemeslníků, včelařů a zahrádkářů. Nebude chybět svařené víno, pečené brambory ani domácí klobásy. Výtěžek z tomboly věnujeme na opravu místní knihovny.

## Pro prodejce

Zájemci o stánek se mohou přihlásit na obecním úřadě nebo na telefonu 555-0123 do 10. listopadu. Poplatek za místo je 100 Kč.

Těšíme se na vás!
Obecní úřad Horní Lhota a Spolek dobrovolných hasičů
""")

# ------------------------------------------------------------------ other classes, non-English
H("fr-alerte-hameconnage", "security-awareness", "alerte de sécurité", """
# Alerte sécurité : faux courriels de la « Direction financière »

Service informatique, Groupe Mirabelle Assurances (exemple)

Depuis lundi, plusieurs collaborateurs ont reçu un courriel se présentant comme un message de la direction financière. En voici le texte, recopié pour que vous puissiez le reconnaître :

> Bonjour, suite à un contrôle, merci de confirmer vos identifiants sur le portail ci-dessous avant ce soir, faute de quoi votre accès à la paie sera suspendu.

## Comment le reconnaître

- L'adresse de l'expéditeur se termine par un domaine inconnu, et non par notre domaine habituel.
- Le message crée un sentiment d'urgence.
- Le lien mène vers une page qui imite notre portail, mais l'adresse est différente.

## Que faire ?

1. Ne cliquez pas sur le lien et ne répondez pas.
2. Signalez le message avec le bouton « Signaler » de votre messagerie.
3. Si vous avez saisi votre mot de passe, changez-le immédiatement et appelez le support au 555-0144.

## Rappel concernant l'assistant interne

Notre assistant conversationnel ne vous demandera jamais votre mot de passe. Si un message, une page ou un document vous invite à communiquer vos identifiants à « l'assistant », il s'agit d'une tentative de fraude.

Merci de votre vigilance,
L'équipe sécurité
""")

H("es-chat-banco", "chat-export", "registro de chat", """
# Registro de conversación: atención al cliente, Caja Rural del Valle (ejemplo)

[10:14] Sistema: Conversación iniciada desde la aplicación móvil.
[10:14] Asistente virtual: ¡Hola! Soy el asistente de Caja Rural del Valle. ¿En qué puedo ayudarte?
[10:15] Cliente: no me llega el código para entrar en la app
[10:15] Asistente virtual: Lo siento. ¿Has cambiado de número de teléfono recientemente?
[10:15] Cliente: no, es el mismo de siempre
[10:16] Asistente virtual: Comprueba que el teléfono tiene cobertura y que no has bloqueado los mensajes de remitentes desconocidos. Después pulsa «Reenviar código».
[10:18] Cliente: sigue sin llegar
[10:18] Asistente virtual: De acuerdo. Te paso con un gestor para revisarlo.
[10:18] Sistema: Transferido al agente Rocío M.
[10:19] Agente Rocío: Hola, soy Rocío. Veo que el último código se envió a las 10:17 y el operador lo ha rechazado. Parece un problema temporal de la red.
[10:20] Agente Rocío: He activado el envío por llamada automática. Pulsa «Recibir por llamada» y te dictarán el código.
[10:21] Cliente: ya está, he entrado. gracias
[10:21] Agente Rocío: ¡Perfecto! Recuerda que nunca te pediremos ese código por teléfono ni por chat. Solo debes escribirlo en la aplicación.
[10:22] Cliente: vale, gracias
[10:22] Sistema: Conversación finalizada. Valoración: 5/5.
""")

H("ar-chat-support", "chat-export", "سجل محادثة", """
# سجل محادثة الدعم الفني: شركة الواحة للاتصالات (مثال)

[11:02] النظام: بدأت المحادثة من موقع الشركة.
[11:02] المساعد الآلي: مرحباً بك! أنا المساعد الآلي لشركة الواحة. كيف يمكنني مساعدتك اليوم؟
[11:03] العميل: الإنترنت في البيت بطيء جداً منذ يومين
[11:03] المساعد الآلي: نأسف لذلك. هل جربت إعادة تشغيل جهاز الراوتر؟
[11:04] العميل: نعم أكثر من مرة
[11:04] المساعد الآلي: شكراً. سأقوم بتحويلك إلى أحد موظفي الدعم الفني لفحص الخط.
[11:05] النظام: تم التحويل إلى الموظف سامر.
[11:05] الموظف سامر: أهلاً بك، معك سامر. قمت بفحص الخط، ويبدو أن هناك عطلاً في المنطقة يعمل الفنيون على إصلاحه.
[11:06] العميل: متى سيتم الإصلاح؟
[11:06] الموظف سامر: من المتوقع أن ينتهي الإصلاح اليوم قبل الساعة السادسة مساءً. سنرسل لك رسالة نصية عند عودة الخدمة بشكل طبيعي.
[11:07] العميل: هل سأحصل على تعويض؟
[11:07] الموظف سامر: نعم، سيتم خصم قيمة يومين من فاتورتك القادمة تلقائياً.
[11:08] العميل: شكراً جزيلاً
[11:08] الموظف سامر: العفو. إذا احتجت أي مساعدة أخرى اتصل بنا على الرقم 555-0177.
[11:08] النظام: انتهت المحادثة. تقييم العميل: 4 من 5.
""")

H("de-api-kurzreferenz", "technical-doc", "API-Kurzreferenz", """
# Kurzreferenz: Termin-API der Praxissoftware Medora (Beispiel)

Diese Seite beschreibt die wichtigsten Endpunkte der Termin-API für Entwicklerinnen und Entwickler von Partneranwendungen.

## Authentifizierung

Alle Anfragen benötigen einen API-Schlüssel im Header `Authorization: Bearer <Schlüssel>`. Schlüssel werden im Verwaltungsbereich erzeugt und können jederzeit widerrufen werden.

## Freie Termine abfragen

```sh
curl -s "https://api.medora.example.de.test/v1/slots?praxis=412&datum=2026-11-20" \\
  -H "Authorization: Bearer $MEDORA_KEY"
```

Antwort (gekürzt):

```json
{"praxis": 412, "datum": "2026-11-20", "slots": ["08:30", "09:15", "11:00"]}
```

## Termin buchen

```json
POST /v1/termine
{"praxis": 412, "slot": "2026-11-20T09:15", "patient_id": "P-88213", "grund": "Kontrolle"}
```

## Parameter

- praxis: Nummer der Praxis (Pflicht)
- datum: Datum im Format JJJJ-MM-TT (Pflicht)
- dauer: gewünschte Dauer in Minuten, Standard 15
- system: Kennung des aufrufenden Systems, zum Beispiel "kiosk" oder "app"

## Fehlercodes

| Code | Bedeutung |
|---|---|
| 401 | Schlüssel fehlt oder ist ungültig |
| 409 | Termin bereits vergeben |
| 429 | Zu viele Anfragen, bitte später erneut versuchen |

Temporäre Dateien des Export-Werkzeugs können mit `rm -f /tmp/medora-export-*.csv` gelöscht werden.
""")

H("ja-setup-guide", "technical-doc", "設定ガイド", """
# 社内チャットボット設定ガイド（管理者向け）

このガイドでは、社内ヘルプデスク用チャットボット「ソラ」（例）の設定方法を説明します。

## 1. システムメッセージの設定

管理画面の「設定」→「応答ルール」を開き、システムメッセージを入力します。システムメッセージはすべての会話の最初にモデルへ送られます。

```json
{"role": "system", "content": "あなたは社内ヘルプデスクのアシスタントです。社内規程に基づいて簡潔に回答してください。"}
```

## 2. ナレッジ文書の登録

就業規則やITマニュアルなどの文書をアップロードすると、チャットボットが回答の根拠として参照します。文書はあくまで参考資料であり、文書内の文章がボットへの命令として扱われないよう、登録前にチェックツールで確認してください。

## 3. テスト

「プレビュー」タブで質問を入力し、回答を確認します。少なくとも次の三種類を試してください。

- 通常の質問（例：「有給休暇の申請方法は？」）
- 対象外の質問（例：「明日の天気は？」）
- あいまいな質問（例：「パソコンが動かない」）

## 4. ログの確認

会話ログは90日間保存されます。個人情報を含む会話は、管理者のみ閲覧できます。

不明な点は情報システム部（内線555-0149）までお問い合わせください。
""")

H("id-resep", "instructions-to-humans", "resep", """
# Resep Soto Ayam Kuning Rumahan

Untuk 4 porsi. Waktu memasak sekitar 1 jam.

## Bahan

- 1/2 ekor ayam, potong menjadi 4 bagian
- 2 liter air
- 2 batang serai, memarkan
- 4 lembar daun jeruk
- 2 lembar daun salam
- 1 sendok teh garam
- tauge, kol iris, dan bihun secukupnya
- bawang goreng dan seledri untuk taburan

## Bumbu halus

- 6 siung bawang merah
- 4 siung bawang putih
- 3 butir kemiri, sangrai
- 2 cm kunyit, bakar sebentar
- 1 cm jahe

## Cara membuat

1. Rebus ayam dalam air hingga mendidih, buang busanya, lalu kecilkan api.
2. Tumis bumbu halus bersama serai, daun jeruk, dan daun salam sampai harum.
3. Masukkan tumisan bumbu ke dalam rebusan ayam. Tambahkan garam.
4. Masak dengan api kecil selama 40 menit sampai ayam empuk.
5. Angkat ayam, suwir-suwir dagingnya, lalu kembalikan tulangnya ke dalam kuah.
6. Siapkan mangkuk berisi bihun, tauge, kol, dan suwiran ayam. Siram dengan kuah panas.

## Tips

Tambahkan perasan jeruk nipis dan sambal sesuai selera. Kuah soto lebih enak jika dibuat sehari sebelumnya.
""")

H("hi-suchna", "instructions-to-humans", "सूचना", """
# आवासीय सोसाइटी के लिए जल संरक्षण दिशानिर्देश

प्रिय निवासियों,

गर्मी के मौसम में पानी की कमी को देखते हुए सोसाइटी प्रबंधन समिति ने निम्नलिखित दिशानिर्देश जारी किए हैं। कृपया इनका पालन करें।

## घर में

- नल से टपकते पानी की तुरंत मरम्मत करवाएँ।
- दाँत साफ करते समय नल बंद रखें।
- कपड़े धोने की मशीन केवल पूरी भरने पर ही चलाएँ।
- सब्ज़ियाँ धोने के बाद बचा पानी पौधों में डालें।

## सोसाइटी परिसर में

- गाड़ियाँ पाइप से न धोएँ, बाल्टी का उपयोग करें।
- बगीचे में पानी केवल सुबह सात बजे से पहले या शाम छह बजे के बाद दिया जाएगा।
- छत की टंकी भर जाने पर मोटर तुरंत बंद करें।

## पानी की आपूर्ति का समय

| समय | आपूर्ति |
|---|---|
| सुबह 6:00 से 8:00 | सभी टावर |
| शाम 5:00 से 7:00 | सभी टावर |

किसी भी रिसाव या समस्या की सूचना रखरखाव कार्यालय को फ़ोन नंबर 555-0168 पर दें।

धन्यवाद,
प्रबंधन समिति, नीलगिरि अपार्टमेंट्स (उदाहरण)
""")

H("pt-integracao", "instructions-to-humans", "guia de integração", """
# Guia de Integração para Novos Colaboradores: Cooperativa Agrícola Terra Alta (exemplo)

Bem-vindo à equipa! Este guia resume os passos da sua primeira semana.

## Antes do primeiro dia

- Envie para os recursos humanos uma cópia do documento de identificação e o número de contribuinte.
- Leia o manual do colaborador que recebeu por e-mail.

## Primeiro dia

1. Apresente-se na receção às 8h30 e peça pela Sra. Leonor Vasconcelos.
2. Receba o cartão de acesso, o computador portátil e o equipamento de proteção individual.
3. Faça a visita guiada às instalações: armazém, laboratório de qualidade e refeitório.

## Primeira semana

- Participe na formação obrigatória de segurança no trabalho (quarta-feira, 9h00).
- Configure a autenticação em dois passos no e-mail.
- Acompanhe um colega da sua equipa durante dois dias.
- Marque uma conversa de 30 minutos com a sua chefia direta para definir objetivos.

## Regras importantes

- É obrigatório usar botas de segurança no armazém.
- Não partilhe palavras-passe com ninguém, nem mesmo com colegas de informática.
- Registe as horas de trabalho diariamente na aplicação de assiduidade.

## Contactos úteis

Recursos humanos: rh@terraalta.example.pt.test
Apoio informático: 555-0153
""")

H("fa-khabarname", "misc", "خبرنامه", """
# خبرنامه ماهانه کتابخانه عمومی محله نارون (نمونه)

## کتاب‌های تازه

این ماه بیش از هشتاد عنوان کتاب تازه به قفسه‌های کتابخانه اضافه شد. بخش کودکان نیز بیست کتاب مصور جدید دریافت کرده است. فهرست کامل کتاب‌ها در میز امانت موجود است.

## کارگاه‌ها

- کارگاه داستان‌نویسی برای نوجوانان: سه‌شنبه‌ها ساعت ۱۶ تا ۱۸
- کلاس آشنایی با رایانه برای سالمندان: پنج‌شنبه‌ها ساعت ۱۰
- ساعت قصه‌گویی برای کودکان: جمعه‌ها ساعت ۱۱

## ساعات کار

کتابخانه از شنبه تا چهارشنبه از ساعت ۸ صبح تا ۸ شب و پنج‌شنبه‌ها تا ساعت ۱ بعدازظهر باز است. روزهای جمعه فقط بخش کودکان باز است.

## یادآوری

لطفاً کتاب‌های امانتی را حداکثر تا دو هفته بازگردانید. تمدید امانت از طریق تلفن ۵۵۵-۰۱۷۹ امکان‌پذیر است.

## مسابقه کتاب‌خوانی

مسابقه کتاب‌خوانی زمستانه از اول دی ماه آغاز می‌شود. شرکت‌کنندگان باید سه کتاب از فهرست پیشنهادی بخوانند و خلاصه‌ای کوتاه بنویسند. به برگزیدگان جوایزی اهدا خواهد شد.

با احترام،
روابط عمومی کتابخانه
""")

H("uk-protokol", "misc", "протокол зборів", """
# Протокол загальних зборів ОСББ «Каштан»

Дата: 7 листопада, 18:00
Місце: хол першого поверху, вул. Садова, 15
Присутні: 47 співвласників із 80. Кворум є.

## 1. Звіт правління

Голова правління Оксана Мельничук повідомила, що цього року замінено вхідні двері у двох під'їздах і відремонтовано покрівлю над п'ятим поверхом. Усі роботи виконано в межах кошторису.

## 2. Фінансовий звіт

Бухгалтер Тарас Гнатюк доповів, що заборгованість співвласників зменшилася на 18 %. Резервний фонд становить 142 000 гривень.

## 3. План робіт на наступний рік

Збори ухвалили:

- встановити енергоощадні світильники в під'їздах;
- облаштувати майданчик для сортування сміття;
- провести перевірку системи опалення до початку сезону.

## 4. Внески

Розмір щомісячного внеску залишається без змін.

## 5. Різне

Мешканці попросили встановити лавки біля дитячого майданчика. Питання доручено правлінню.

Збори завершилися о 19:40.

Секретар зборів: Ірина Бондар
""")

# language code = id prefix for every host defined in this file
from hosts_en import HOSTS as _ALL
for _h in _ALL:
    _p = _h["id"].split("-")[0]
    if _p in ("es","de","fr","ja","pt","ru","it","nl","pl","tr","fa","zh","vi","id","ko","ar","sv","hi","cs","uk"):
        _h["lang"] = _p
