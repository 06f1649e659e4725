package dev.filmshear.cli.report;

/**
 * The page's stylesheet, inlined so the report is one file: a single centred column that narrows to the screen,
 * tables that scroll sideways inside their own box on a phone, and a print sheet (no backgrounds, black rules,
 * each section from a new page, plots sized so that two fit a page). System fonts only; nothing is fetched.
 */
final class ReportStyle {
    /** The CSS; kept free of {@code <} and {@code &} so the page also parses as XML. */
    static final String CSS = """
            :root {
              --ink: #1d2329; --muted: #56616b; --rule: #cfd5da; --accent: #1b6f6a; --tint: #eef4f3;
              --caution: #8a5300; --caution-bg: #fff5df; --alert: #a3361b; --alert-bg: #fcefeb;
            }
            * { box-sizing: border-box; }
            html { -webkit-text-size-adjust: 100%; text-size-adjust: 100%; }
            body {
              margin: 0; color: var(--ink); background: #e9ecee;
              font: 16px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif;
            }
            .page { max-width: 62rem; margin: 0 auto; padding: 1.75rem 2rem 3rem; background: #fff; }
            .title-block { border-bottom: 3px solid var(--accent); padding-bottom: 1rem; }
            .kicker {
              margin: 0; color: var(--accent); font-size: .78rem; font-weight: 700;
              letter-spacing: .09em; text-transform: uppercase;
            }
            h1 { margin: .3rem 0 1rem; font-size: 1.65rem; line-height: 1.25; overflow-wrap: anywhere; }
            .meta {
              display: grid; grid-template-columns: repeat(auto-fit, minmax(13rem, 1fr)); gap: .6rem 1.5rem; margin: 0;
            }
            .meta dt { color: var(--muted); font-size: .74rem; letter-spacing: .06em; text-transform: uppercase; }
            .meta dd { margin: 0; overflow-wrap: anywhere; }
            .meta a { color: var(--accent); }
            .meta a.warn-count { color: var(--alert); font-weight: 700; }
            .status-ok { color: var(--accent); font-weight: 600; }
            .status-failed { color: var(--alert); font-weight: 700; }
            .box { margin: 1rem 0; padding: .8rem 1rem; border: 1px solid; border-left-width: .5rem; }
            .box p { margin: 0; }
            .box p + p { margin-top: .35rem; }
            .box-head { font-size: .82rem; font-weight: 700; letter-spacing: .06em; text-transform: uppercase; }
            .box-head code { letter-spacing: 0; text-transform: none; }
            .caution { border-color: var(--caution); background: var(--caution-bg); }
            .caution .box-head { color: var(--caution); }
            .stopped, .warning { border-color: var(--alert); background: var(--alert-bg); }
            .stopped { border-width: 2px 2px 2px .5rem; }
            .stopped .box-head, .warning .box-head { color: var(--alert); }
            .contents { margin: 1.25rem 0 0; font-size: .92rem; }
            .contents ol { margin: .25rem 0 0; padding-left: 1.4rem; columns: 2 14rem; }
            .contents a { color: var(--accent); }
            h2 {
              margin: 2.25rem 0 .8rem; padding-bottom: .3rem; border-bottom: 1px solid var(--rule); font-size: 1.3rem;
            }
            h2 .no { margin-right: .5rem; color: var(--accent); }
            h3 { margin: 1.5rem 0 .5rem; font-size: 1.05rem; }
            .quiet { color: var(--muted); }
            .table-scroll { overflow-x: auto; -webkit-overflow-scrolling: touch; }
            table { width: 100%; min-width: 34rem; border-collapse: collapse; font-variant-numeric: tabular-nums; }
            th, td {
              padding: .35rem .6rem; border-bottom: 1px solid var(--rule); text-align: left; vertical-align: top;
            }
            thead th {
              border-bottom: 2px solid var(--ink); color: var(--muted); font-size: .74rem;
              letter-spacing: .06em; text-transform: uppercase;
            }
            tbody th { font-weight: 500; }
            tr.group th { padding-top: .7rem; background: var(--tint); color: var(--accent); font-weight: 700; }
            .num { text-align: right; white-space: nowrap; }
            td.key code { color: var(--muted); font-size: .8rem; }
            code, pre { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, "Liberation Mono", monospace; }
            ul.warnings { margin: 0; padding: 0; list-style: none; }
            .facts { display: grid; grid-template-columns: max-content 1fr; gap: .3rem 1rem; margin: 0 0 1rem; }
            .facts dt { color: var(--muted); }
            .facts dd { margin: 0; overflow-wrap: anywhere; }
            figure { margin: 0 0 1.75rem; }
            img { display: block; max-width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { margin-top: .4rem; color: var(--muted); font-size: .92rem; }
            .figno { color: var(--ink); font-weight: 700; }
            pre {
              margin: 0; padding: .75rem; overflow-x: auto; background: #f6f7f8; border: 1px solid var(--rule);
              font-size: .84rem; line-height: 1.45;
            }
            footer {
              margin-top: 2.5rem; padding-top: .5rem; border-top: 1px solid var(--rule); color: var(--muted);
              font-size: .8rem;
            }
            @media (max-width: 40rem) {
              body { font-size: 15px; }
              .page { padding: 1rem .8rem 2rem; }
              h1 { font-size: 1.3rem; }
              .facts { grid-template-columns: 1fr; }
            }
            @media print {
              @page { margin: 15mm 14mm; }
              body, .page { max-width: none; margin: 0; padding: 0; background: none; color: #000; font-size: 10.5pt; }
              .contents { display: none; }
              main > section + section { break-before: page; page-break-before: always; }
              h2, h3 { break-after: avoid; page-break-after: avoid; }
              .box, tr.group th, pre { background: none; }
              .box { border: 1pt solid #000; border-left-width: 4pt; }
              .stopped { border-width: 2.5pt 2.5pt 2.5pt 5pt; }
              .box-head, .status-ok, .status-failed, h2 .no, tr.group th, .kicker, .contents a { color: #000; }
              .title-block { border-bottom-color: #000; }
              .table-scroll { overflow: visible; }
              table { min-width: 0; }
              tr, figure, .box { break-inside: avoid; page-break-inside: avoid; }
              img { width: auto; max-width: 100%; max-height: 10.5cm; border: none; }
              pre { overflow: visible; white-space: pre-wrap; overflow-wrap: anywhere; border: 1pt solid #777; }
              a { color: inherit; text-decoration: none; }
            }
            """;

    private ReportStyle() {
    }
}
