using System.Globalization;

namespace CellCheck.IO.Data;

/// <summary>
/// How numbers are written in a source: the decimal separator and the declared thousands separator (none: refused).
/// Text is normalised to invariant form (decimal point, no grouping) before parsing; a text that uses the other of
/// '.' and ',' between digits when no thousands separator was declared is reported as a likely thousands separator.
/// </summary>
internal sealed record NumberSyntax(char Decimal, char? Thousands)
{
    public static NumberSyntax Invariant { get; } = new('.', null);

    /// <summary>True when normalising changes nothing in a plain numeral ([+-]digits[.digits]): a decimal point and no
    /// thousands separator, so such a numeral can be parsed as it stands.</summary>
    public bool KeepsPlainNumerals => Decimal == '.' && Thousands is null;

    /// <summary>Normalises <paramref name="text"/> into <paramref name="buffer"/>; false with <paramref name="grouping"/> when a
    /// thousands separator appears undeclared.</summary>
    public bool TryNormalize(ReadOnlySpan<char> text, Span<char> buffer, out int length, out bool grouping)
    {
        length = 0;
        grouping = false;
        var other = Decimal == '.' ? ',' : '.';
        if (text.Length > buffer.Length)
        {
            return false;
        }

        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (Thousands is { } t && c == t)
            {
                continue;
            }

            if (c == other && Thousands is null && i > 0 && i + 1 < text.Length && char.IsAsciiDigit(text[i - 1]) && char.IsAsciiDigit(text[i + 1]))
            {
                grouping = true;
                return false;
            }

            buffer[length++] = c == Decimal ? '.' : c;
        }

        return true;
    }

    /// <summary>Parses a number written in this syntax (NaN when it is not one).</summary>
    public double ParseDouble(ReadOnlySpan<char> text)
    {
        Span<char> buffer = stackalloc char[Math.Min(text.Length, 128)];
        return text.Length <= 128 && TryNormalize(text, buffer, out var n, out _)
            && double.TryParse(buffer[..n], NumberStyles.Float, CultureInfo.InvariantCulture, out var value) ? value : double.NaN;
    }
}
