using CellCheck.Core.Problems;
using YamlDotNet.RepresentationModel;

namespace CellCheck.IO.Design;

/// <summary>
/// Reads the entries of <c>factors</c>, <c>responses</c> and <c>run_order</c>: each a column name, or a mapping
/// with <c>column</c>, optional <c>name</c> and <c>unit</c>, and for factors <c>kind: categorical|numeric</c>.
/// </summary>
internal sealed class ColumnEntryReader(string path, List<Problem> problems)
{
    private static readonly string[] FactorKeys = ["column", "name", "unit", "kind"];
    private static readonly string[] ResponseKeys = ["column", "name", "unit"];

    public List<ColumnSpec> ReadList(YamlNode node, string key, bool isFactor)
    {
        var result = new List<ColumnSpec>();
        if (node is YamlScalarNode scalar && !string.IsNullOrWhiteSpace(scalar.Value))
        {
            // A single column written without brackets: factors: temperature
            if (ReadEntry(node, isFactor, key) is { } single)
            {
                result.Add(single);
            }

            return result;
        }

        if (node is not YamlSequenceNode sequence)
        {
            Add(ProblemCodes.WrongType, node, $"'{key}' must be a list of columns.", $"Write for example {key}: [a, b] or one '- a' line per column.");
            return result;
        }

        if (sequence.Children.Count == 0)
        {
            Add(ProblemCodes.EmptyList, node, $"'{key}' lists no columns.", $"Name at least one column under '{key}'.");
        }

        foreach (var child in sequence.Children)
        {
            if (ReadEntry(child, isFactor, key) is { } spec)
            {
                result.Add(spec);
            }
        }

        return result;
    }

    public ColumnSpec? ReadEntry(YamlNode node, bool isFactor, string key)
    {
        var mark = DesignValidator.Mark(node);
        if (node is YamlScalarNode { Value: { } text } && !string.IsNullOrWhiteSpace(text))
        {
            return new ColumnSpec(text, text, null, FactorKind.Categorical, mark);
        }

        if (node is not YamlMappingNode mapping)
        {
            Add(ProblemCodes.WrongType, node, $"An entry of '{key}' must be a column name or a mapping with 'column'.",
                "Write the column name, or column: NAME with optional name, unit" + (isFactor ? " and kind." : "."));
            return null;
        }

        var allowed = isFactor ? FactorKeys : ResponseKeys;
        string? column = null, name = null, unit = null;
        var kind = FactorKind.Categorical;
        foreach (var (k, v) in mapping.Children)
        {
            var field = (k as YamlScalarNode)?.Value ?? string.Empty;
            var value = (v as YamlScalarNode)?.Value;
            if (!allowed.Contains(field))
            {
                var near = Suggest.Closest(field, allowed);
                Add(ProblemCodes.UnknownKey, k, $"Unknown key '{field}' in an entry of '{key}'.",
                    (near is null ? string.Empty : $"Did you mean '{near}'? ") + "Allowed: " + string.Join(", ", allowed) + ".");
                continue;
            }

            if (value is null)
            {
                Add(ProblemCodes.WrongType, v, $"'{field}' must be a single value.", $"Write {field}: VALUE on one line.");
                continue;
            }

            switch (field)
            {
                case "column": column = value; break;
                case "name": name = value; break;
                case "unit": unit = value; break;
                default: kind = ReadKind(value, v); break;
            }
        }

        if (string.IsNullOrWhiteSpace(column))
        {
            Add(ProblemCodes.MissingKey, node, $"An entry of '{key}' has no 'column'.", "Add column: NAME with the data file's column header.");
            return null;
        }

        return new ColumnSpec(column, string.IsNullOrWhiteSpace(name) ? column : name, unit, kind, mark);
    }

    private FactorKind ReadKind(string value, YamlNode node)
    {
        switch (value)
        {
            case "categorical": return FactorKind.Categorical;
            case "numeric": return FactorKind.Numeric;
            default:
                Add(ProblemCodes.BadKind, node, $"Unknown factor kind '{value}'.", "Use kind: categorical or kind: numeric.");
                return FactorKind.Categorical;
        }
    }

    private void Add(string code, YamlNode node, string what, string fix)
    {
        var mark = DesignValidator.Mark(node);
        problems.Add(new Problem(code, path, mark.Line, mark.Column, what, fix));
    }
}
