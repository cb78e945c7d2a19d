using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>Greedy word wrapping by measured width.</summary>
internal static class TextWrap
{
    public static List<string> Lines(string text, SKFont font, float width)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.Split('\n'))
        {
            var line = string.Empty;
            foreach (var word in paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                var candidate = line.Length == 0 ? word : line + " " + word;
                if (line.Length > 0 && font.MeasureText(candidate) > width)
                {
                    lines.Add(line);
                    line = word;
                }
                else
                {
                    line = candidate;
                }
            }

            lines.Add(line);
        }

        return lines;
    }

    /// <summary>The text cut with an ellipsis to fit the width.</summary>
    public static string Fit(string text, SKFont font, float width)
    {
        if (font.MeasureText(text) <= width)
        {
            return text;
        }

        for (var n = text.Length - 1; n > 0; n--)
        {
            var cut = text[..n].TrimEnd() + "\u2026";
            if (font.MeasureText(cut) <= width)
            {
                return cut;
            }
        }

        return "\u2026";
    }
}
