/**
 * The style sheet of the HTML report, inlined in its <style> element (the page's content
 * security policy allows inline style and nothing else). A single column that prints well:
 * warm paper, dark ink, one accent per kind of message.
 */

/** The report's CSS. */
export const PAGE_STYLE = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { margin: 0; background: #f7f5ef; color: #2d2c28; font: 15px/1.5 Georgia, "Times New Roman", serif; }
main { max-width: 940px; margin: 0 auto; padding: 28px 36px 48px; background: #fffdf8; border-left: 1px solid #e4dfd2; border-right: 1px solid #e4dfd2; }
header { border-bottom: 3px double #cfc7b4; padding-bottom: 12px; margin-bottom: 18px; }
.brand { margin: 0; font: 600 12px/1 Verdana, Geneva, sans-serif; letter-spacing: 0.18em; text-transform: uppercase; color: #1f5f66; }
h1 { margin: 6px 0 4px; font-size: 26px; font-weight: normal; }
.names { margin: 0; color: #5d5a50; font-style: italic; }
h2 { font-size: 19px; font-weight: normal; border-bottom: 1px solid #e4dfd2; padding-bottom: 3px; margin: 30px 0 10px; }
h3 { font-size: 17px; margin: 0 0 8px; }
h4 { font: 600 13px/1.4 Verdana, Geneva, sans-serif; color: #5d5a50; margin: 18px 0 6px; }
section.caution { background: #fbf3e4; border: 1px solid #e2c99a; border-left: 6px solid #b4552f; padding: 6px 18px 10px; margin: 0 0 8px; }
section.caution h2 { border: none; margin: 6px 0 2px; font-size: 16px; color: #8a3d1f; }
section.caution ul { margin: 4px 0; padding-left: 20px; }
ol.findings li, ul.verdicts li { margin: 4px 0; }
ul.warnings { padding-left: 20px; }
ul.warnings li { margin: 4px 0; color: #6b3a1c; }
ul.warnings li::marker { content: "! "; font-weight: bold; }
ul.data { padding-left: 20px; }
ol.contents { columns: 2; font-size: 14px; }
a { color: #1f5f66; }
article.pair { border: 1px solid #e4dfd2; border-radius: 4px; padding: 14px 18px 12px; margin: 18px 0; background: #fffefb; break-inside: avoid-page; }
.tag { font: 600 11px/1 Verdana, Geneva, sans-serif; padding: 3px 7px; border-radius: 10px; vertical-align: middle; margin-left: 8px; white-space: nowrap; }
.tag-yes { background: #dcebe5; color: #1d5a45; }
.tag-maybe { background: #f4e7c4; color: #6f5310; }
.tag-no { background: #ece9e2; color: #5d5a50; }
.tag-off { background: #efe2ea; color: #6e2e52; }
dl.figures { display: grid; grid-template-columns: repeat(auto-fit, minmax(190px, 1fr)); gap: 8px; margin: 12px 0; }
.figure { border-top: 2px solid #1f5f66; padding: 4px 2px; }
.figure dt { font: 11px/1.3 Verdana, Geneva, sans-serif; text-transform: uppercase; letter-spacing: 0.06em; color: #6d6a60; }
.figure dd { margin: 2px 0 0; font-size: 15px; }
figure { margin: 12px 0; }
figcaption { font-size: 13px; color: #5d5a50; }
svg { display: block; background: #fffefb; }
table { border-collapse: collapse; width: 100%; font: 13px/1.4 Verdana, Geneva, sans-serif; margin: 6px 0; }
th { text-align: left; font-weight: 600; border-bottom: 1.5px solid #8a8577; padding: 4px 6px; }
td { border-bottom: 1px solid #ece8dd; padding: 3px 6px; vertical-align: top; }
th.num, td.num { text-align: right; font-variant-numeric: tabular-nums; }
p.note { font-size: 13px; color: #5d5a50; margin: 4px 0; }
details summary { cursor: pointer; color: #1f5f66; }
footer { margin-top: 34px; border-top: 1px solid #e4dfd2; font-size: 13px; color: #6d6a60; }
@media print { body { background: #fff; } main { border: none; } }
`;
