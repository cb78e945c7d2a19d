namespace CellCheck.IO.Data;

/// <summary>Cell texts read as "no value": empty (after trimming) and NA.</summary>
internal static class MissingTokens
{
    public static bool IsMissing(ReadOnlySpan<char> text) => text.IsEmpty || text.SequenceEqual("NA");
}
