namespace CellCheck.IO.Data;

/// <summary>Cell texts read as "no value": empty cells always, and the design's <c>missing</c> list (default NA), compared after trimming.</summary>
internal sealed class MissingTokens
{
    private readonly HashSet<string> _tokens;

    public MissingTokens(IEnumerable<string> tokens)
    {
        _tokens = new HashSet<string>(tokens.Select(t => t.Trim()), StringComparer.Ordinal);
    }

    public static MissingTokens Default { get; } = new(["NA", ""]);

    public bool IsMissing(ReadOnlySpan<char> text) => text.IsEmpty || _tokens.GetAlternateLookup<ReadOnlySpan<char>>().Contains(text);
}
