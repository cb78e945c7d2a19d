using System.Globalization;
using MiniExcelLibs;

namespace CellCheck.IO.Tests.Inputs;

/// <summary>Writes test workbooks: rows of cells (first row = header), numbers stored as numbers where they parse.</summary>
internal static class WorkbookFiles
{
    public static void Write(string path, IReadOnlyList<string[]> rows, string sheet = "trial")
    {
        var letters = Enumerable.Range(0, rows.Max(r => r.Length)).Select(i => ((char)('A' + i)).ToString()).ToArray();
        var data = rows.Select(r =>
        {
            var d = new Dictionary<string, object?>();
            for (var c = 0; c < letters.Length; c++)
            {
                var text = c < r.Length ? r[c] : string.Empty;
                d[letters[c]] = text.Length == 0 ? null
                    : double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var x) ? x : text;
            }

            return d;
        }).ToList();
        MiniExcel.SaveAs(path, data, printHeader: false, sheetName: sheet, overwriteFile: true);
    }

    public static List<string[]> ReadCsv(string path) => File.ReadAllLines(path).Where(l => l.Length > 0).Select(l => l.Split(',')).ToList();
}
