package org.nullpath.report;

/** The report's stylesheet: plain type, thin rules, one accent, and a print layout. */
final class Style {
    private Style() {
    }

    static final String CSS = """
            :root { --ink: #1d1d1d; --soft: #555; --rule: #d6d6d6; --accent: #0072b2; --warn: #d55e00; }
            * { box-sizing: border-box; }
            body { margin: 0 auto; max-width: 1000px; padding: 28px 24px 48px; color: var(--ink); background: #fff;
                   font-family: "DejaVu Sans", "Liberation Sans", "Helvetica Neue", Arial, sans-serif;
                   font-size: 15px; line-height: 1.45; }
            h1 { font-size: 1.9em; margin: 0.1em 0 0.3em; line-height: 1.2; }
            h2 { font-size: 1.35em; margin: 2em 0 0.6em; padding-bottom: 0.2em; border-bottom: 2px solid var(--ink); }
            h3 { font-size: 1.15em; margin: 1.6em 0 0.5em; }
            h4 { font-size: 1em; margin: 0 0 0.3em; }
            code, pre { font-family: "DejaVu Sans Mono", "Liberation Mono", Menlo, monospace; font-size: 0.9em; }
            a { color: var(--accent); }
            .masthead { border-bottom: 1px solid var(--rule); padding-bottom: 0.6em; }
            .kicker { margin: 0; color: var(--accent); font-size: 0.8em; letter-spacing: 0.12em;
                      text-transform: uppercase; font-weight: bold; }
            .meta { margin: 0; color: var(--soft); font-size: 0.9em; }
            .caution { margin: 1.2em 0; padding: 0.7em 1em; border-left: 6px solid var(--warn); background: #fcf0e6; }
            .caution h2 { margin: 0 0 0.3em; border: 0; padding: 0; font-size: 1em; color: #8a3a00; }
            .caution p { margin: 0; }
            .contents ol { margin: 0.4em 0; padding-left: 1.4em; }
            .contents ol ol { display: inline; padding: 0; }
            .contents ol ol li { display: inline; margin-right: 0.8em; }
            .contents ol ol li::before { content: "\\2022\\00a0"; color: var(--soft); }
            figure { margin: 1.4em 0 1.8em; }
            figure svg.chart { display: block; width: 100%; height: auto; margin: 0 auto; border: 1px solid #e4e4e4; }
            figcaption { font-size: 0.88em; color: #333; margin-top: 0.4em; }
            figcaption p { margin: 0 0 0.3em; }
            ul.key { list-style: none; margin: 0.2em 0 0; padding: 0; display: flex; flex-wrap: wrap; gap: 0.2em 1.4em; }
            ul.key li { display: flex; align-items: center; }
            .swatch { display: inline-block; width: 2.2em; margin-right: 0.45em; flex: none; }
            .link h3 .ends { font-weight: normal; color: var(--soft); margin-left: 0.4em; }
            .link { border-top: 1px solid var(--rule); margin-top: 2em; }
            table { border-collapse: collapse; margin: 0.4em 0 1em; font-size: 0.9em; }
            table.grid { width: 100%; }
            table.grid th, table.grid td { border: 1px solid var(--rule); padding: 0.3em 0.55em; text-align: left;
                                           vertical-align: top; }
            table.grid thead th { background: #f1f1f1; font-weight: bold; }
            table.grid tbody tr:nth-child(even) td { background: #fafafa; }
            table.facts th { text-align: left; font-weight: normal; color: var(--soft); padding: 0.15em 1.2em 0.15em 0;
                             vertical-align: top; white-space: nowrap; }
            table.facts td { padding: 0.15em 0; }
            td.none { color: var(--soft); }
            .empty { color: var(--soft); font-style: italic; }
            pre.scenario { background: #f6f6f6; border: 1px solid var(--rule); padding: 0.8em 1em; overflow-x: auto;
                           line-height: 1.35; }
            footer { margin-top: 3em; border-top: 1px solid var(--rule); color: var(--soft); font-size: 0.85em; }
            @media print {
              @page { margin: 14mm 12mm; }
              body { max-width: none; padding: 0; font-size: 9.5pt; }
              nav.contents { display: none; }
              a { color: inherit; text-decoration: none; }
              h2, h3, h4 { break-after: avoid; }
              figure, table, .caution { break-inside: avoid; }
              section.link { break-before: page; border: 0; }
              figure svg.chart { border: 0; }
              .caution { background: none; border: 1pt solid #000; border-left: 4pt solid #000; }
              pre.scenario { white-space: pre-wrap; background: none; }
              table.grid tbody tr:nth-child(even) td, table.grid thead th { background: none; }
            }
            """;
}
