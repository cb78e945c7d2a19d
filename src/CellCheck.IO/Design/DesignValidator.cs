using System.Globalization;
using CellCheck.Core.Problems;
using CellCheck.Core.Statistics;
using YamlDotNet.RepresentationModel;

namespace CellCheck.IO.Design;

/// <summary>Checks the top level of a design file and collects every problem it finds (not just the first).</summary>
internal sealed class DesignValidator(string path, YamlMappingNode root, string[] keys)
{
    private readonly List<Problem> _problems = [];

    public LoadResult<DesignFile> Validate()
    {
        var seen = new Dictionary<string, YamlNode>(StringComparer.Ordinal);
        foreach (var (keyNode, valueNode) in root.Children)
        {
            var key = (keyNode as YamlScalarNode)?.Value ?? string.Empty;
            if (!keys.Contains(key))
            {
                var near = Suggest.Closest(key, keys);
                Add(ProblemCodes.UnknownKey, keyNode, $"Unknown key '{key}'.",
                    near is null ? "Allowed keys: " + string.Join(", ", keys) + "." : $"Did you mean '{near}'? Allowed keys: " + string.Join(", ", keys) + ".");
                continue;
            }

            if (!seen.TryAdd(key, valueNode))
            {
                Add(ProblemCodes.DuplicateKey, keyNode, $"The key '{key}' is written twice.", "Keep one of the two entries.");
            }
        }

        var data = RequiredScalar(seen, "data", "the data file, relative to the design file (for example data: trial.csv)");
        var entries = new ColumnEntryReader(path, _problems);
        var factors = seen.TryGetValue("factors", out var f) ? entries.ReadList(f, "factors", isFactor: true) : Missing("factors", "the factor columns, for example factors: [temperature, speed]");
        var responses = seen.TryGetValue("responses", out var r) ? entries.ReadList(r, "responses", isFactor: false) : Missing("responses", "the measured response columns, for example responses: [yield]");
        var blocks = seen.TryGetValue("blocks", out var bl) ? entries.ReadList(bl, "blocks", isFactor: false) : [];
        var runOrder = seen.TryGetValue("run_order", out var ro) ? entries.ReadEntry(ro, isFactor: false, "run_order") : null;
        var model = seen.TryGetValue("model", out var mo) ? ModelReader.Read(mo, factors, blocks, path, _problems) : ModelDeclaration.Default;
        var alpha = ReadAlpha(seen);
        var adjust = ReadAdjust(seen);
        var name = seen.TryGetValue("name", out var n) ? Scalar(n, "name") : null;
        var options = new DataOptionsReader(path, _problems).Read(seen);
        var across = ReadAdjustAcross(seen);
        CrossCheck(factors.Concat(blocks).ToList(), responses, runOrder);

        if (_problems.Count > 0 || data is null)
        {
            return LoadResult<DesignFile>.Failure(_problems);
        }

        var folder = System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(path)) ?? ".";
        var dataPath = System.IO.Path.GetFullPath(System.IO.Path.Combine(folder, data.Value.Text));
        return LoadResult<DesignFile>.Success(new DesignFile(path, name, dataPath, data.Value.Text, data.Value.Mark, factors, responses, runOrder, alpha, adjust, blocks, model)
        {
            Options = options,
            AdjustAcross = across,
        });
    }

    private void CrossCheck(IReadOnlyList<ColumnSpec> factors, IReadOnlyList<ColumnSpec> responses, ColumnSpec? runOrder)
    {
        var names = new Dictionary<string, ColumnSpec>(StringComparer.Ordinal);
        var factorColumns = new HashSet<string>(factors.Select(x => x.Column), StringComparer.Ordinal);
        foreach (var spec in factors.Concat(responses))
        {
            if (!names.TryAdd(spec.Name, spec))
            {
                Add(ProblemCodes.DuplicateName, spec.Mark, $"The name '{spec.Name}' is used twice (first at line {names[spec.Name].Mark.Line}).",
                    "Give each factor, block and response its own column, or a distinct display name.");
            }
        }

        foreach (var spec in responses.Where(x => factorColumns.Contains(x.Column)))
        {
            Add(ProblemCodes.ResponseIsFactor, spec.Mark, $"The column '{spec.Column}' is both a factor and a response.",
                "A column is either a factor (it defines cells) or a response (it is measured); remove it from one list.");
        }

        if (runOrder is not null && (factorColumns.Contains(runOrder.Column) || responses.Any(x => x.Column == runOrder.Column)))
        {
            Add(ProblemCodes.DuplicateName, runOrder.Mark, $"The run-order column '{runOrder.Column}' is also a factor or response.",
                "Name the column that holds the run sequence, which is neither a factor nor a response.");
        }
    }

    private double ReadAlpha(Dictionary<string, YamlNode> seen)
    {
        if (!seen.TryGetValue("alpha", out var node))
        {
            return 0.05;
        }

        var text = Scalar(node, "alpha");
        if (text is not null && double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var alpha) && alpha > 0 && alpha <= 0.5)
        {
            return alpha;
        }

        Add(ProblemCodes.BadAlpha, node, $"alpha must be a number above 0 and at most 0.5; found '{text}'.", "Write for example alpha: 0.05 (with a decimal point).");
        return 0.05;
    }

    private AdjustAcross ReadAdjustAcross(Dictionary<string, YamlNode> seen)
    {
        if (!seen.TryGetValue("adjust_across", out var node))
        {
            return AdjustAcross.Cells;
        }

        switch (Scalar(node, "adjust_across"))
        {
            case "cells": return AdjustAcross.Cells;
            case "cells-and-responses": return AdjustAcross.CellsAndResponses;
            default:
                Add(ProblemCodes.BadAdjustAcross, node, "adjust_across must be cells or cells-and-responses.", "Write adjust_across: cells (default) or adjust_across: cells-and-responses.");
                return AdjustAcross.Cells;
        }
    }

    private AdjustMethod ReadAdjust(Dictionary<string, YamlNode> seen)
    {
        if (!seen.TryGetValue("adjust", out var node))
        {
            return AdjustMethod.Holm;
        }

        var text = Scalar(node, "adjust");
        if (text is not null && DesignReader.ParseAdjust(text) is { } method)
        {
            return method;
        }

        Add(ProblemCodes.BadAdjust, node, $"Unknown adjustment '{text}'.", "Use holm (default), bh (Benjamini-Hochberg) or none.");
        return AdjustMethod.Holm;
    }

    private (string Text, SourceMark Mark)? RequiredScalar(Dictionary<string, YamlNode> seen, string key, string what)
    {
        if (!seen.TryGetValue(key, out var node))
        {
            Missing(key, what);
            return null;
        }

        var text = Scalar(node, key);
        return string.IsNullOrWhiteSpace(text) ? null : (text, Mark(node));
    }

    private string? Scalar(YamlNode node, string key)
    {
        if (node is YamlScalarNode { Value: { } value })
        {
            return value;
        }

        Add(ProblemCodes.WrongType, node, $"'{key}' must be a single value.", $"Write it on one line, for example {key}: value.");
        return null;
    }

    private List<ColumnSpec> Missing(string key, string what)
    {
        _problems.Add(new Problem(ProblemCodes.MissingKey, path, 1, 1, $"The design has no '{key}' entry.", $"Add '{key}:' naming {what}."));
        return [];
    }

    private void Add(string code, YamlNode node, string what, string fix) => Add(code, Mark(node), what, fix);

    private void Add(string code, SourceMark mark, string what, string fix) => _problems.Add(new Problem(code, path, mark.Line, mark.Column, what, fix));

    internal static SourceMark Mark(YamlNode node) => new((int)node.Start.Line, (int)node.Start.Column);
}
