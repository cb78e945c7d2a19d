using System.Text.RegularExpressions;

namespace CellCheck.Cli.Tests;

public sealed partial class HtmlReportTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "cellcheck-html-" + Guid.NewGuid().ToString("N"));

    public HtmlReportTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string Page(string design)
    {
        var html = Path.Combine(_folder, Path.GetFileNameWithoutExtension(design) + ".html");
        var (code, _, err) = CliRunner.Run("check", design, "--html", html, "--quiet");
        Assert.True(code is 0 or 1, err);
        return html;
    }

    [GeneratedRegex(@"<dt>Generated</dt><dd>[^<]*</dd>|<dt>Tool</dt><dd>[^<]*</dd>")]
    private static partial Regex Volatile();

    /// <summary>Pictures are tested as plot models and renders elsewhere; the golden page keeps only their place.</summary>
    [GeneratedRegex(@"<svg[\s\S]*?</svg>")]
    private static partial Regex Picture();

    [GeneratedRegex(@"<svg width=""([0-9.]+)"" height=""([0-9.]+)""")]
    private static partial Regex SvgSize();

    [Fact]
    public void The_page_of_the_field_trial_matches_its_golden_file_apart_from_date_and_version()
    {
        var text = File.ReadAllText(Page(CliRunner.Design("field-trial.yaml")));
        Assert.Equal(2, Picture().Count(text));
        GoldenFile.Match("field-trial.html", CliRunner.Portable(Picture().Replace(Volatile().Replace(text, "<!-- volatile -->"), "<svg><!-- picture --></svg>")));
    }

    [Fact]
    public void The_page_is_self_contained_and_forbids_scripts()
    {
        var text = File.ReadAllText(Page(CliRunner.Design("coating-cure.yaml")));
        Assert.Contains("Content-Security-Policy", text, StringComparison.Ordinal);
        Assert.Contains("script-src 'none'", text, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("http://", text, StringComparison.Ordinal);
        Assert.DoesNotContain("https://", text, StringComparison.Ordinal);
        Assert.DoesNotMatch(@"\son[a-z]+\s*=", text);
        Assert.Contains("SHA-256", text, StringComparison.Ordinal);
        Assert.Contains("support judgement", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Hostile_names_render_as_text_in_a_real_browser_and_run_nothing()
    {
        var data = Path.Combine(_folder, "hostile.csv");
        File.WriteAllText(data, "\"<script>alert(1)</script>\",y\n\"\"\"><img src=x onerror=alert(1)>\",1\n\"\"\"><img src=x onerror=alert(1)>\",2\nb,3\nb,5\n");
        var design = Path.Combine(_folder, "hostile.yaml");
        File.WriteAllText(design, "name: \"<b>bold</b>\"\ndata: hostile.csv\nfactors: [\"<script>alert(1)</script>\"]\nresponses: [y]\n");
        var page = Page(design);
        var text = File.ReadAllText(page);
        Assert.DoesNotContain("<script>alert", text, StringComparison.Ordinal);
        Assert.DoesNotContain("<img src=x", text, StringComparison.Ordinal);

        var (_, dom, err) = Chromium.Run(Path.Combine(_folder, "profile-dom"), "--dump-dom", "file://" + page);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", dom, StringComparison.Ordinal);
        Assert.DoesNotContain("<img", dom, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", dom, StringComparison.Ordinal);
        Assert.DoesNotContain("Uncaught", err, StringComparison.Ordinal);
    }

    [Fact]
    public void The_page_loads_without_console_errors_prints_to_pdf_pages_and_can_be_looked_at()
    {
        var page = Page(CliRunner.Design("coating-cure.yaml"));
        Assert.Equal(4, Picture().Count(File.ReadAllText(page)));
        var (_, dom, _) = Chromium.Run(Path.Combine(_folder, "profile-svg"), "--dump-dom", "file://" + page);
        var sizes = SvgSize().Matches(dom);
        Assert.Equal(4, sizes.Count);
        Assert.All(sizes, m => Assert.True(double.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) > 0
            && double.Parse(m.Groups[2].Value, System.Globalization.CultureInfo.InvariantCulture) > 0, "a picture has no size"));
        var shot = Path.Combine(AppContext.BaseDirectory, "coating-cure-page.png");
        var (_, _, err) = Chromium.Run(Path.Combine(_folder, "profile-shot"), "--window-size=1200,2000", "--screenshot=" + shot, "file://" + page);
        Assert.True(new FileInfo(shot).Length > 10_000, "screenshot is empty");
        Assert.DoesNotMatch("CONSOLE.*(Error|Refused|Uncaught)", err);
        var pdf = Path.Combine(_folder, "page.pdf");
        Chromium.Run(Path.Combine(_folder, "profile-pdf"), "--no-pdf-header-footer", "--print-to-pdf=" + pdf, "file://" + page);
        var bytes = File.ReadAllBytes(pdf);
        Assert.Equal("%PDF", System.Text.Encoding.ASCII.GetString(bytes, 0, 4));
        Assert.True(Regex.Count(System.Text.Encoding.Latin1.GetString(bytes), @"/Type\s*/Page[^s]") >= 2, "the report should print to several pages");
    }
}
