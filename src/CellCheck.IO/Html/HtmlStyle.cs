namespace CellCheck.IO.Html;

/// <summary>The page's own style sheet: readable on screen and on A4/Letter paper, sticky table headers, status by
/// word and symbol with a colour-blind-safe accent (blue-green pass, vermilion flag, grey not testable).</summary>
internal static class HtmlStyle
{
    public const string Css = """
        :root { --ink: #1d232a; --muted: #5b6672; --rule: #d7dde3; --pass: #00795c; --flag: #b34700; --nt: #6b7280; --band: #f3f6f8; }
        * { box-sizing: border-box; }
        body { font-family: "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; color: var(--ink); margin: 0 auto; max-width: 1100px; padding: 24px 28px 48px; line-height: 1.45; font-size: 15px; }
        header.top { border-bottom: 3px solid var(--ink); padding-bottom: 10px; margin-bottom: 18px; }
        header.top h1 { font-size: 24px; margin: 0 0 6px; }
        dl.meta { display: grid; grid-template-columns: max-content 1fr; gap: 2px 14px; margin: 0; font-size: 13px; color: var(--muted); }
        dl.meta dt { font-weight: 600; } dl.meta dd { margin: 0; word-break: break-all; }
        h2 { font-size: 20px; margin: 32px 0 8px; border-bottom: 1px solid var(--rule); padding-bottom: 4px; }
        h3 { font-size: 16px; margin: 20px 0 6px; }
        .verdict { border: 2px solid var(--rule); border-left-width: 8px; padding: 10px 16px; margin: 10px 0 18px; background: var(--band); }
        .verdict.flag { border-left-color: var(--flag); } .verdict.pass { border-left-color: var(--pass); } .verdict.not-testable { border-left-color: var(--nt); }
        .verdict p.head { font-size: 17px; font-weight: 700; margin: 0 0 6px; }
        .verdict ul { margin: 0; padding-left: 20px; }
        .table { max-height: 560px; overflow: auto; border: 1px solid var(--rule); margin: 6px 0 12px; }
        table { border-collapse: collapse; width: 100%; font-size: 13px; }
        caption { text-align: left; font-weight: 600; padding: 6px 8px; }
        th, td { padding: 4px 8px; border-bottom: 1px solid var(--rule); text-align: left; vertical-align: top; }
        thead th { position: sticky; top: 0; background: #fff; border-bottom: 2px solid var(--ink); }
        .num { text-align: right; font-variant-numeric: tabular-nums; }
        .st { font-weight: 600; white-space: nowrap; } .st.pass { color: var(--pass); } .st.flag { color: var(--flag); } .st.nt { color: var(--nt); font-weight: 400; }
        figure { margin: 12px 0 20px; } figure svg { max-width: 100%; height: auto; border: 1px solid var(--rule); }
        figcaption { font-size: 13px; color: var(--muted); }
        .note { color: var(--muted); font-size: 13px; }
        .caution { border-top: 3px solid var(--ink); margin-top: 36px; padding-top: 10px; font-size: 14px; }
        ol.refs li { font-size: 13px; margin-bottom: 2px; }
        @media print {
          body { max-width: none; padding: 0; font-size: 10.5pt; }
          .table { max-height: none; overflow: visible; border: none; }
          thead { display: table-header-group; }
          h2 { break-after: avoid; } figure, .verdict, tr { break-inside: avoid; }
          @page { size: auto; margin: 16mm 14mm; }
        }
        """;
}
