package dev.filmshear.cli.verify;

/**
 * The verification page's stylesheet, inlined so the report is one file: the look of the run report (its colours,
 * one centred column, tables that scroll sideways on a phone, a print sheet), written again here because the run
 * report's stylesheet (report/ReportStyle.java) is not visible from this package.
 */
final class VerificationStyle {
    /** The CSS; free of {@code <} and {@code &} so the page also parses as XML. */
    static final String CSS = """
            :root { --ink: #1d2329; --muted: #56616b; --rule: #cfd5da; --accent: #1b6f6a; --tint: #eef4f3;
                    --caution: #8a5300; --caution-bg: #fff5df; --alert: #a3361b; }
            * { box-sizing: border-box; }
            body { margin: 0; color: var(--ink); background: #e9ecee;
                   font: 16px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; }
            .page { max-width: 66rem; margin: 0 auto; padding: 1.75rem 2rem 3rem; background: #fff; }
            .title-block { border-bottom: 3px solid var(--accent); padding-bottom: 1rem; }
            .kicker { margin: 0; color: var(--accent); font-size: .78rem; font-weight: 700; letter-spacing: .09em;
                      text-transform: uppercase; }
            h1 { margin: .3rem 0 1rem; font-size: 1.65rem; line-height: 1.25; }
            .meta { display: grid; grid-template-columns: repeat(auto-fit, minmax(13rem, 1fr)); gap: .6rem 1.5rem;
                    margin: 0; }
            .meta dt { color: var(--muted); font-size: .74rem; letter-spacing: .06em; text-transform: uppercase; }
            .meta dd { margin: 0; }
            .pass { color: var(--accent); font-weight: 700; }
            .fail { color: var(--alert); font-weight: 700; }
            .box { margin: 1rem 0; padding: .8rem 1rem; border: 1px solid; border-left-width: .5rem; }
            .box p { margin: 0; }
            .box-head { font-size: .82rem; font-weight: 700; letter-spacing: .06em; text-transform: uppercase; }
            .caution { border-color: var(--caution); background: var(--caution-bg); }
            .caution .box-head { color: var(--caution); }
            h2 { margin: 2.25rem 0 .8rem; padding-bottom: .3rem; border-bottom: 1px solid var(--rule);
                 font-size: 1.3rem; }
            h2 .no { margin-right: .5rem; color: var(--accent); }
            h3 { margin: 2rem 0 .5rem; font-size: 1.08rem; }
            .case { border-top: 1px solid var(--rule); }
            .table-scroll { overflow-x: auto; -webkit-overflow-scrolling: touch; }
            table { width: 100%; border-collapse: collapse; font-variant-numeric: tabular-nums; margin: .5rem 0 1rem; }
            th, td { padding: .3rem .5rem; border-bottom: 1px solid var(--rule); text-align: left;
                     vertical-align: top; }
            thead th { border-bottom: 2px solid var(--ink); color: var(--muted); font-size: .74rem;
                       letter-spacing: .04em; }
            tbody th { font-weight: 500; }
            .num { text-align: right; white-space: nowrap; }
            table.errors { font-size: .9rem; }
            a { color: var(--accent); }
            code { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, "Liberation Mono", monospace; }
            .facts { display: grid; grid-template-columns: max-content 1fr; gap: .3rem 1rem; margin: 0 0 .5rem; }
            .facts dt { color: var(--muted); }
            .facts dd { margin: 0; overflow-wrap: anywhere; }
            figure { margin: .5rem 0 1.5rem; }
            img { display: block; max-width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { margin-top: .4rem; color: var(--muted); font-size: .9rem; }
            .figno { color: var(--ink); font-weight: 700; }
            footer { margin-top: 2.5rem; padding-top: .5rem; border-top: 1px solid var(--rule); color: var(--muted);
                     font-size: .8rem; }
            @media (max-width: 40rem) { .page { padding: 1rem .8rem 2rem; } .facts { grid-template-columns: 1fr; } }
            @media print {
              body, .page { max-width: none; margin: 0; padding: 0; background: none; color: #000; font-size: 10pt; }
              .box { background: none; border: 1pt solid #000; border-left-width: 4pt; }
              .table-scroll { overflow: visible; }
              .case, tr, figure { break-inside: avoid; page-break-inside: avoid; }
              img { max-height: 9cm; width: auto; border: none; }
              a { color: inherit; text-decoration: none; }
            }
            """;

    private VerificationStyle() {
    }
}
