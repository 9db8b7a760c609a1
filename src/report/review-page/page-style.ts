/**
 * The review page's style sheet. Levels differ by colour AND by a shape and a written label, so the
 * page reads the same in greyscale, in print and to a screen reader. The print rules drop the filter
 * controls, keep each flag on one page and print each source's address after its link.
 */
export const PAGE_STYLE = `
:root { --ink: #1d2327; --muted: #5b6670; --paper: #fbfaf7; --rule: #d9d4c7; --error: #9e2a2b; --warning: #8a5300; --note: #2f5d86; --ref: #3d6b4f; }
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink); font: 16px/1.5 Georgia, "DejaVu Serif", serif; }
main { max-width: 60rem; margin: 0 auto; padding: 1.5rem 1.25rem 4rem; }
h1, h2, h3 { font-family: "Helvetica Neue", Arial, "DejaVu Sans", sans-serif; line-height: 1.2; }
h1 { font-size: 1.6rem; margin: 0 0 .25rem; }
h2 { font-size: 1.2rem; margin: 2rem 0 .75rem; padding-bottom: .25rem; border-bottom: 2px solid var(--ink); word-break: break-all; }
.caution { color: var(--muted); font-size: .92rem; max-width: 44rem; }
.summary { display: flex; flex-wrap: wrap; gap: .5rem 1.5rem; margin: 1rem 0; padding: .75rem 1rem; border: 1px solid var(--rule); background: #fff; font-family: Arial, "DejaVu Sans", sans-serif; }
.summary b { font-size: 1.3rem; display: block; }
.files { font-family: Arial, "DejaVu Sans", sans-serif; font-size: .92rem; }
.filters { position: sticky; top: 0; z-index: 1; display: flex; flex-wrap: wrap; align-items: center; gap: .5rem 1rem; padding: .5rem .75rem; margin: 1rem 0; background: #efece4; border: 1px solid var(--rule); font-family: Arial, "DejaVu Sans", sans-serif; font-size: .92rem; }
.filters fieldset { border: 0; margin: 0; padding: 0; display: flex; gap: .75rem; align-items: center; }
.filters legend { float: left; margin-right: .5rem; font-weight: bold; }
.shown { margin-left: auto; color: var(--muted); }
.claim { margin: 0 0 1.25rem; padding: .75rem 1rem; background: #fff; border: 1px solid var(--rule); border-left: 4px solid var(--muted); }
.claim.worst-error { border-left-color: var(--error); }
.claim.worst-warning { border-left-color: var(--warning); }
.claim.worst-note { border-left-color: var(--note); }
.place { font-family: "DejaVu Sans Mono", Menlo, monospace; font-size: .85rem; color: var(--muted); }
.sentence { margin: .35rem 0 .5rem; font-size: 1.05rem; }
.sentence mark { background: none; border-bottom: 3px double currentColor; padding: 0 1px; color: inherit; }
.verdict { font-family: Arial, "DejaVu Sans", sans-serif; font-size: .8rem; text-transform: uppercase; letter-spacing: .04em; color: var(--muted); }
.flag { margin: .75rem 0 0; padding-top: .6rem; border-top: 1px dashed var(--rule); }
.flag-head { display: flex; gap: .6rem; align-items: center; font-family: Arial, "DejaVu Sans", sans-serif; font-size: .9rem; }
.badge { display: inline-flex; align-items: center; gap: .3rem; font-weight: bold; text-transform: uppercase; font-size: .78rem; letter-spacing: .05em; }
.badge svg, .filters svg { width: 14px; height: 14px; vertical-align: -2px; }
.filters label { display: inline-flex; align-items: center; gap: .3rem; }
.filters .shape-error { color: var(--error); } .filters .shape-warning { color: var(--warning); } .filters .shape-note { color: var(--note); }
.filters svg * { fill: currentColor; }
.level-error .badge { color: var(--error); } .level-warning .badge { color: var(--warning); } .level-note .badge { color: var(--note); }
.badge svg * { fill: currentColor; }
.rule { font-family: "DejaVu Sans Mono", Menlo, monospace; font-size: .85rem; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: .2rem .9rem; margin: .5rem 0; }
dt { font-family: Arial, "DejaVu Sans", sans-serif; font-size: .8rem; color: var(--muted); text-transform: uppercase; letter-spacing: .04em; padding-top: .2rem; }
dd { margin: 0; }
.correction { font-weight: bold; }
.number-line { display: block; width: 100%; max-width: 40rem; height: auto; margin: .5rem 0; font-family: Arial, "DejaVu Sans", sans-serif; font-size: 12px; }
.number-line text { fill: var(--ink); }
.number-line .tick { fill: var(--muted); font-size: 11px; }
.number-line .axis line { stroke: var(--ink); stroke-width: 1; }
.number-line .hatch { stroke: var(--ref); stroke-width: 2.5; }
.number-line .outline { fill: none; stroke: var(--ref); stroke-width: 1.5; }
.number-line .reference text { fill: var(--ref); font-weight: bold; }
.number-line .bar { stroke: var(--ink); stroke-width: 5; stroke-linecap: butt; }
.number-line .draft circle { fill: var(--paper); stroke: var(--ink); stroke-width: 2.5; }
.number-line .open-end { fill: var(--ink); }
.sources { margin: .25rem 0 0; padding-left: 1.1rem; font-size: .9rem; }
.sources a { color: var(--note); word-break: break-word; }
.memory { font-style: italic; color: var(--warning); }
.skipped { color: var(--muted); font-size: .9rem; }
.empty { color: var(--muted); font-style: italic; }
[hidden] { display: none !important; }
@media print {
  body { background: #fff; font-size: 11pt; }
  main { max-width: none; padding: 0; }
  .filters { display: none; }
  .claim { break-inside: avoid; border-color: #999; }
  .sources a::after { content: " <" attr(href) ">"; color: #000; font-size: 9pt; }
  h2 { break-after: avoid; }
}
`;
