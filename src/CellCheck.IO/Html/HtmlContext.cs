namespace CellCheck.IO.Html;

/// <summary>What the HTML page says about where it came from: data file digest, generation time, tool version, and
/// the pictures to embed (per response, a title and inline SVG markup produced by CellCheck itself).</summary>
public sealed record HtmlContext(string DataSha256, DateTimeOffset Generated, string ToolVersion)
{
    public IReadOnlyDictionary<string, IReadOnlyList<(string Title, string Svg)>> Pictures { get; init; } =
        new Dictionary<string, IReadOnlyList<(string Title, string Svg)>>(StringComparer.Ordinal);
}
