package html

// pageCSS styles the page on screen and on paper. Text is #1a1a1a on
// white (contrast about 17:1), muted text #4d4d4d (about 8.5:1), and the
// warning box marks each item with a word as well as an orange rule.
// Contrast figures: WCAG 2.1 relative-luminance formula.
const pageCSS = `:root { color-scheme: light; }
html { background: #ffffff; }
body { margin: 0 auto; max-width: 60rem; padding: 1.5rem 1.25rem 3rem;
  font: 16px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", "DejaVu Sans", sans-serif;
  color: #1a1a1a; background: #ffffff; }
h1 { font-size: 1.9rem; line-height: 1.2; margin: 0 0 0.25rem; }
h2 { font-size: 1.4rem; margin: 2.2rem 0 0.6rem; padding-bottom: 0.2rem; border-bottom: 2px solid #1a1a1a; }
h3 { font-size: 1.15rem; margin: 1.6rem 0 0.5rem; }
.subtitle { margin: 0 0 1rem; color: #4d4d4d; font-size: 1.1rem; }
nav { border: 1px solid #bdbdbd; padding: 0.5rem 1rem; margin: 1rem 0 1.5rem; }
nav .toc-title { font-size: 1rem; border: 0; margin: 0.2rem 0; padding: 0; }
nav ol { margin: 0.2rem 0; padding-left: 1.4rem; columns: 2; }
a { color: #0b4f8a; }
a:focus-visible, button:focus-visible { outline: 3px solid #0b4f8a; outline-offset: 2px; }
p, ul, ol, dl { margin: 0.5rem 0 0.9rem; }
pre { background: #f3f3f3; color: #1a1a1a; padding: 0.6rem 0.8rem; overflow-x: auto; white-space: pre-wrap;
  font: 0.85rem/1.4 ui-monospace, "DejaVu Sans Mono", monospace; border: 1px solid #d6d6d6; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: 0.25rem 1rem; }
dt { font-weight: 600; }
dd { margin: 0; overflow-wrap: anywhere; }
.table-wrap { overflow-x: auto; margin: 0.8rem 0 1.2rem; }
table { border-collapse: collapse; font-size: 0.92rem; min-width: 50%; }
caption { caption-side: top; text-align: left; font-weight: 600; padding: 0.2rem 0 0.4rem; }
th, td { border: 1px solid #bdbdbd; padding: 0.25rem 0.55rem; text-align: left; vertical-align: top; }
thead th { background: #e8edf2; }
tbody th { background: #f5f7f9; font-weight: 600; }
.num { text-align: right; font-variant-numeric: tabular-nums; }
figure { margin: 1rem 0 1.4rem; padding: 0.5rem; border: 1px solid #d6d6d6; }
figure svg, figure img { display: block; max-width: 100%; height: auto; margin: 0 auto; }
@media screen {
  figure svg.frequency-chart, figure svg.histogram { width: 100%; }
  figure svg.polar-pattern { width: min(100%, 34rem); }
}
figcaption { margin-top: 0.4rem; font-size: 0.92rem; color: #4d4d4d; }
.warnings { list-style: none; padding: 0.4rem 0.8rem; border-left: 6px solid #b35900; background: #fff4e5; }
.warnings li { margin: 0.25rem 0; }
.switch-bar { display: flex; flex-wrap: wrap; gap: 0.4rem; margin: 0.6rem 0 0; }
.switch-bar button { font: inherit; padding: 0.25rem 0.8rem; border: 2px solid #0b4f8a; background: #ffffff; color: #0b4f8a; cursor: pointer; }
.switch-bar button[aria-pressed="true"] { background: #0b4f8a; color: #ffffff; text-decoration: underline; }
footer { margin-top: 2.5rem; padding-top: 0.5rem; border-top: 1px solid #bdbdbd; color: #4d4d4d; font-size: 0.9rem; }
@page { margin: 15mm 14mm 16mm; }
@media print {
  body { max-width: none; padding: 0; font-size: 10pt; }
  h1 { font-size: 18pt; }
  h2 { font-size: 14pt; margin-top: 14pt; }
  h3 { font-size: 12pt; }
  h2, h3, caption { break-after: avoid; page-break-after: avoid; }
  figure, table, dl, pre, .warnings { break-inside: avoid; page-break-inside: avoid; }
  thead { display: table-header-group; }
  tr { break-inside: avoid; }
  nav ol { columns: 2; }
  a { color: inherit; text-decoration: none; }
  .switch-bar { display: none; }
  .switch figure[hidden] { display: block !important; }
  figure svg, figure img { max-height: 220mm; width: auto; }
}
`

// switchScript turns each .switch holding two or more figures into a row
// of buttons that show one figure at a time. Without it every figure
// shows; on paper the print styles show them all again.
const switchScript = `(function () {
  document.querySelectorAll(".switch").forEach(function (s) {
    var figs = Array.prototype.filter.call(s.children, function (c) { return c.tagName === "FIGURE"; });
    if (figs.length < 2) { return; }
    var bar = document.createElement("div");
    bar.className = "switch-bar";
    bar.setAttribute("role", "group");
    bar.setAttribute("aria-label", s.getAttribute("data-label") || "Choose a view");
    var buttons = figs.map(function (f, i) {
      var b = document.createElement("button");
      b.type = "button";
      b.textContent = f.getAttribute("data-name");
      b.setAttribute("aria-controls", f.id);
      b.addEventListener("click", function () { show(i); });
      bar.appendChild(b);
      return b;
    });
    function show(k) {
      figs.forEach(function (f, i) { f.hidden = i !== k; buttons[i].setAttribute("aria-pressed", String(i === k)); });
    }
    s.insertBefore(bar, s.firstChild);
    show(0);
  });
})();
`
