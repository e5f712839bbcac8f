package org.treeproof.report;

/**
 * The report's style sheet, inlined so the file is complete offline. Colours are from the palette of M. Okabe and
 * K. Ito, "Color Universal Design" (2008), which stays distinguishable with the common colour-vision deficiencies;
 * colour never carries meaning alone (every marked row also says so in words). No web fonts: the reader's own
 * system fonts.
 */
final class ReportStyle {
    private ReportStyle() {
    }

    static final String CSS = """
            :root { --ink: #1d1d1f; --muted: #5b5b60; --rule: #d6d6da; --panel: #f6f6f7;
              --blue: #0072B2; --green: #009E73; --orange: #E69F00; --vermillion: #D55E00; --sky: #56B4E9;
              --mark: #e7f1f8; }
            * { box-sizing: border-box; }
            html { font-size: 15px; }
            body { margin: 0 auto; max-width: 80rem; padding: 1.5rem 2rem 3rem; color: var(--ink); background: #fff;
              font-family: system-ui, -apple-system, "Segoe UI", "Helvetica Neue", Arial, sans-serif; line-height: 1.5; }
            h1 { font-size: 1.6rem; margin: 0 0 .25rem; font-weight: 650; }
            h2 { font-size: 1.25rem; margin: 2.2rem 0 .6rem; padding-bottom: .25rem; border-bottom: 2px solid var(--ink); }
            h3 { font-size: 1.02rem; margin: 1.4rem 0 .4rem; }
            p, li { max-width: 52rem; }
            .meta { color: var(--muted); margin: 0; }
            nav ol { display: flex; flex-wrap: wrap; gap: .2rem 1.2rem; padding: 0; margin: 1rem 0 0; list-style: none;
              font-size: .93rem; }
            a, nav a { color: var(--blue); }
            .verdict { border-left: .45rem solid var(--muted); background: var(--panel); padding: .8rem 1.1rem;
              margin: .6rem 0 1rem; font-size: 1.08rem; }
            .verdict strong { text-transform: uppercase; letter-spacing: .04em; margin-right: .5rem; }
            .verdict-supported { border-left-color: var(--green); }
            .verdict-tentative { border-left-color: var(--orange); }
            .verdict-unsupported { border-left-color: var(--vermillion); }
            dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: .2rem 1.2rem; margin: .5rem 0; }
            dl.facts dt { color: var(--muted); }
            dl.facts dd { margin: 0; }
            .scroll { overflow-x: auto; }
            table { border-collapse: collapse; margin: .4rem 0 .6rem; font-size: .9rem; }
            caption { text-align: left; color: var(--muted); padding-bottom: .3rem; caption-side: top;
              width: max-content; max-width: min(60rem, 90vw); }
            th, td { padding: .25rem .55rem; border-bottom: 1px solid var(--rule); vertical-align: top; text-align: left; }
            thead th { border-bottom: 1.5px solid var(--ink); font-weight: 600; vertical-align: bottom; }
            table.evidence { font-size: .82rem; width: 100%; }
            table.evidence th, table.evidence td { padding: .22rem .35rem; }
            table.evidence thead th { hyphens: auto; }
            td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; }
            td.num { white-space: nowrap; }
            table.evidence td.num { white-space: normal; }
            tr.recommended td { background: var(--mark); }
            tr.recommended td:first-child { box-shadow: inset .3rem 0 0 var(--blue); }
            tr.flagged td:first-child { box-shadow: inset .3rem 0 0 var(--vermillion); }
            .tag { display: inline-block; font-size: .78rem; font-weight: 600; padding: 0 .35rem; border-radius: .2rem;
              border: 1px solid currentColor; margin-left: .3rem; }
            .tag-recommended { color: var(--blue); }
            .yes { color: var(--green); font-weight: 600; }
            .no { color: var(--vermillion); font-weight: 600; }
            .note, .footnote { color: var(--muted); font-size: .86rem; }
            figure { margin: 1rem 0 1.4rem; max-width: 60rem; }
            figure img { max-width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { font-size: .88rem; color: var(--muted); margin-top: .3rem; }
            figure.absent { border: 1px dashed var(--rule); padding: .6rem .9rem; }
            pre { background: var(--panel); padding: .6rem .8rem; overflow-x: auto; white-space: pre-wrap;
              word-break: break-all; font-size: .86rem; }
            code, .mono { font-family: ui-monospace, "SFMono-Regular", Menlo, Consolas, monospace; }
            .mono { word-break: break-all; }
            .caution { border: 1.5px solid var(--orange); padding: .8rem 1.1rem; background: #fffaf0; }
            ol.references li { margin-bottom: .3rem; }
            footer { margin-top: 2.5rem; color: var(--muted); font-size: .85rem; border-top: 1px solid var(--rule);
              padding-top: .5rem; }
            @page { margin: 14mm 12mm; }
            @media print {
              html { font-size: 10pt; }
              body { max-width: none; padding: 0; }
              nav { display: none; }
              h2 { break-after: avoid; page-break-after: avoid; }
              h3 { break-after: avoid; }
              table, figure, .verdict, .caution { break-inside: avoid; page-break-inside: avoid; }
              table.evidence { font-size: 7.5pt; }
              .scroll { overflow: visible; }
              a { color: inherit; text-decoration: none; }
              tr.recommended td, .verdict, .caution { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
              figure img { max-height: 95vh; }
            }
            """;
}
