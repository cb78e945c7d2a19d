using System.Globalization;
using CellCheck.Core.Problems;
using YamlDotNet.RepresentationModel;

namespace CellCheck.IO.Design;

/// <summary>Reads the data-reading keys of a design file: delimiter, decimal, thousands, missing, sheet, header_row, where.</summary>
internal sealed class DataOptionsReader(string path, List<Problem> problems)
{
    public DataOptions Read(IReadOnlyDictionary<string, YamlNode> seen)
    {
        var delimiter = seen.TryGetValue("delimiter", out var d) ? Delimiter(d) : null;
        var decimalSeparator = seen.TryGetValue("decimal", out var dec) ? Separator(dec, "decimal", [".", ","]) ?? '.' : '.';
        var thousands = seen.TryGetValue("thousands", out var th) ? Separator(th, "thousands", [",", ".", " ", "'"]) : null;
        if (thousands == decimalSeparator)
        {
            Add(ProblemCodes.BadDataOption, th!, "The thousands separator is the same as the decimal separator.", "Declare different characters, for example decimal: \",\" with thousands: \".\".");
        }

        var missing = seen.TryGetValue("missing", out var m) ? Strings(m, "missing") : DataOptions.Default.Missing;
        var sheet = seen.TryGetValue("sheet", out var s) ? (s as YamlScalarNode)?.Value : null;
        var headerRow = seen.TryGetValue("header_row", out var h) ? HeaderRow(h) : 1;
        var where = seen.TryGetValue("where", out var w) ? Where(w) : WhereClause.None;
        return new DataOptions(delimiter, decimalSeparator, thousands, missing, sheet, headerRow, where);
    }

    private char? Delimiter(YamlNode node)
    {
        var text = (node as YamlScalarNode)?.Value;
        switch (text)
        {
            case ",": return ',';
            case ";": return ';';
            case "\t" or "tab": return '\t';
            case "|": return '|';
            default:
                Add(ProblemCodes.BadDataOption, node, $"Unknown delimiter '{text}'.", "Use delimiter: \",\", \";\", tab or \"|\" (or leave it out to detect it).");
                return null;
        }
    }

    private char? Separator(YamlNode node, string key, string[] allowed)
    {
        var text = (node as YamlScalarNode)?.Value;
        if (text is not null && allowed.Contains(text))
        {
            return text[0];
        }

        Add(ProblemCodes.BadDataOption, node, $"Unknown {key} separator '{text}'.", $"Use one of {string.Join(", ", allowed.Select(a => "\"" + a + "\""))}.");
        return null;
    }

    private List<string> Strings(YamlNode node, string key)
    {
        if (node is YamlSequenceNode seq && seq.Children.All(c => c is YamlScalarNode))
        {
            return seq.Children.Select(c => ((YamlScalarNode)c).Value ?? string.Empty).ToList();
        }

        Add(ProblemCodes.WrongType, node, $"'{key}' must be a list of texts.", $"Write for example {key}: [NA, \"-\", \"\"].");
        return [.. DataOptions.Default.Missing];
    }

    private int HeaderRow(YamlNode node)
    {
        var text = (node as YamlScalarNode)?.Value;
        if (int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var row) && row >= 1)
        {
            return row;
        }

        Add(ProblemCodes.BadDataOption, node, $"header_row must be a row number from 1; found '{text}'.", "Write header_row: 1 for a header in the first row.");
        return 1;
    }

    private WhereClause Where(YamlNode node)
    {
        if (node is not YamlMappingNode mapping || mapping.Children.Count == 0)
        {
            Add(ProblemCodes.BadWhere, node, "'where' must map column names to the values to keep.", "Write for example where: { site: north } or where: { site: [north, south] }.");
            return WhereClause.None;
        }

        var conditions = new List<WhereCondition>();
        foreach (var (k, v) in mapping.Children)
        {
            var column = (k as YamlScalarNode)?.Value ?? string.Empty;
            var values = v switch
            {
                YamlScalarNode scalar => [scalar.Value ?? string.Empty],
                YamlSequenceNode seq when seq.Children.All(c => c is YamlScalarNode) => seq.Children.Select(c => ((YamlScalarNode)c).Value ?? string.Empty).ToList(),
                _ => null,
            };
            if (values is null)
            {
                Add(ProblemCodes.BadWhere, v, $"The condition on '{column}' must be a value or a list of values.", "Write for example site: north or site: [north, south].");
                continue;
            }

            conditions.Add(new WhereCondition(column, values, DesignValidator.Mark(k)));
        }

        return new WhereClause(conditions);
    }

    private void Add(string code, YamlNode node, string what, string fix)
    {
        var mark = DesignValidator.Mark(node);
        problems.Add(new Problem(code, path, mark.Line, mark.Column, what, fix));
    }
}
