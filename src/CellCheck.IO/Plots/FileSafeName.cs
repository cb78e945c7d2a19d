using System.Text;

namespace CellCheck.IO.Plots;

/// <summary>A response name made safe as a file name on every system: letters, digits, '.', '-' and '_' are kept,
/// anything else becomes '_'; an empty or dot-only result becomes "response".</summary>
public static class FileSafeName
{
    public static string Of(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var text = new StringBuilder(name.Length);
        foreach (var c in name.Trim())
        {
            text.Append(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '_');
        }

        var safe = text.ToString().Trim('.');
        return safe.Length == 0 ? "response" : safe;
    }
}
