using System.Globalization;
using System.Text;
using CellCheck.Core.Problems;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Scaffold;

/// <summary>
/// Inspects a data file's columns and writes a commented design file proposing factors, responses, blocks and a run
/// order, for the user to edit (lines to review are marked "CHECK"). Never overwrites an existing file.
/// </summary>
public static class DesignScaffold
{
    /// <summary>At most this many rows are inspected.</summary>
    public const int SampleRows = 100_000;

    public static LoadResult<ScaffoldResult> Inspect(string dataPath, string designPath)
    {
        ArgumentNullException.ThrowIfNull(dataPath);
        ArgumentNullException.ThrowIfNull(designPath);
        var relative = Path.GetRelativePath(Path.GetDirectoryName(Path.GetFullPath(designPath)) ?? ".", Path.GetFullPath(dataPath));
        var probe = new DesignFile(designPath, null, Path.GetFullPath(dataPath), relative, new SourceMark(1, 1), [], [], null, 0.05,
            Core.Statistics.AdjustMethod.Holm, [], ModelDeclaration.Default);
        var (table, problem) = TableOpener.Open(probe);
        if (problem is not null)
        {
            return LoadResult<ScaffoldResult>.Failure(problem);
        }

        using (table)
        {
            var values = table!.Header.Select(_ => new List<string>()).ToArray();
            var rows = 0;
            while (rows < SampleRows && table.Next())
            {
                for (var c = 0; c < values.Length; c++)
                {
                    values[c].Add(table.Cell(c).ToString());
                }

                rows++;
            }

            if (table.Fault is { } fault)
            {
                return LoadResult<ScaffoldResult>.Failure(fault);
            }

            var profiles = table.Header.Select((h, c) => ColumnProfiler.Profile(h, values[c])).ToList();
            return LoadResult<ScaffoldResult>.Success(new ScaffoldResult(relative, rows, profiles));
        }
    }

    /// <summary>Writes the proposal to <paramref name="designPath"/>; a problem when that file exists.</summary>
    public static Problem? Write(ScaffoldResult result, string designPath)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (File.Exists(designPath) || Directory.Exists(designPath))
        {
            return new Problem(ProblemCodes.OutputExists, designPath, null, null, "A file of that name exists; init never overwrites.",
                "Choose another name with --out, or move the existing file away.");
        }

        return Reports.AtomicFile.Write(designPath, [], s => s.Write(Encoding.UTF8.GetBytes(Text(result))));
    }

    public static string Text(ScaffoldResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var sb = new StringBuilder();
        sb.AppendLine("# Design proposed by cellcheck init from " + result.DataFile + " (" + result.Rows.ToString(CultureInfo.InvariantCulture) + " rows inspected).");
        sb.AppendLine("# Review every line marked CHECK, then run: cellcheck check THIS_FILE");
        sb.AppendLine("data: " + Quote(result.DataFile));
        Section(sb, "factors", result, ColumnRole.Factor, "few distinct values; columns that set the conditions of each run");
        Section(sb, "responses", result, ColumnRole.Response, "numbers with many distinct values; what was measured");
        Section(sb, "blocks", result, ColumnRole.Block, "nuisance groupings (days, batches): in the model, they do not define cells");
        var order = result.Columns.FirstOrDefault(c => c.Role == ColumnRole.RunOrder);
        sb.AppendLine(order is null ? "# run_order: COLUMN          # CHECK: name the column that holds the run sequence, or write run_order: file" : "run_order: " + Quote(order.Name) + "   # CHECK: the sequence in which the runs were made");
        foreach (var c in result.Columns.Where(c => c.Role == ColumnRole.Ignore || (c.Role == ColumnRole.RunOrder && c != order)))
        {
            sb.AppendLine("# not used: " + c.Name + " (" + c.Distinct.ToString(CultureInfo.InvariantCulture) + " distinct values)");
        }

        sb.AppendLine("alpha: 0.05");
        return sb.ToString();
    }

    private static void Section(StringBuilder sb, string key, ScaffoldResult result, ColumnRole role, string why)
    {
        var columns = result.Columns.Where(c => c.Role == role).ToList();
        if (columns.Count == 0)
        {
            sb.AppendLine("# " + key + ": []   # CHECK: none proposed (" + why + ")");
            return;
        }

        sb.AppendLine(key + ":   # CHECK: " + why);
        foreach (var c in columns)
        {
            var note = c.Distinct.ToString(CultureInfo.InvariantCulture) + " distinct, " + c.Missing.ToString(CultureInfo.InvariantCulture) + " missing"
                + (role == ColumnRole.Factor && c.NumericShare == 1 ? "; numeric levels: add kind: numeric for a linear term" : string.Empty);
            sb.AppendLine("  - " + Quote(c.Name) + "   # " + note);
        }
    }

    private static string Quote(string name) => name.All(ch => char.IsAsciiLetterOrDigit(ch) || ch is '_' or '-' or '.' or '/') ? name : "\"" + name.Replace("\"", "\\\"", StringComparison.Ordinal) + "\"";
}
