namespace CellCheck.IO.Data;

/// <summary>Cell texts read as "no value": empty cells always, and the design's <c>missing</c> list (default NA), compared after trimming.</summary>
internal sealed class MissingTokens
{
    private readonly HashSet<string> _tokens;
    private readonly ulong _lengths; // bit k set when some token has k characters (k < 63), bit 63 for longer ones

    public MissingTokens(IEnumerable<string> tokens)
    {
        _tokens = new HashSet<string>(tokens.Select(t => t.Trim()), StringComparer.Ordinal);
        foreach (var t in _tokens)
        {
            _lengths |= 1UL << Math.Min(t.Length, 63);
        }
    }

    public static MissingTokens Default { get; } = new(["NA", ""]);

    /// <summary>True for an empty cell or a missing token; a text of a length no token has is rejected without hashing.</summary>
    public bool IsMissing(ReadOnlySpan<char> text) =>
        text.IsEmpty || ((_lengths & (1UL << Math.Min(text.Length, 63))) != 0 && _tokens.GetAlternateLookup<ReadOnlySpan<char>>().Contains(text));
}
