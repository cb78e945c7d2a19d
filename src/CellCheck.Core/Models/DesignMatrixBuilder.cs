using CellCheck.Core.Data;

namespace CellCheck.Core.Models;

/// <summary>
/// Builds the design matrix of a model: an intercept; each block's indicators; then for each term the products of
/// its factors' columns, where a categorical factor contributes treatment-contrast indicators (every level present in
/// the rows but the first) and a numeric factor one column of its centred values (a linear term). Blocks come first
/// so that a treatment contrast confounded with blocks is the one found aliased (<see cref="OrderedRank"/>).
/// </summary>
public static class DesignMatrixBuilder
{
    public static DesignMatrix Build(IReadOnlyList<FactorColumn> factors, IReadOnlyList<FactorColumn> blocks, ModelSpec spec, int[] rows)
    {
        ArgumentNullException.ThrowIfNull(factors);
        ArgumentNullException.ThrowIfNull(blocks);
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(rows);
        var columns = new List<(string Name, int Term, double[] Values)> { ("(intercept)", -1, Enumerable.Repeat(1.0, rows.Length).ToArray()) };
        var termNames = spec.Terms.Select(t => t.Name(factors)).Concat(blocks.Select(b => b.Name)).ToList();
        for (var b = 0; b < blocks.Count; b++)
        {
            var termIndex = spec.Terms.Count + b;
            columns.AddRange(Components(blocks[b], rows, forceCategorical: true).Select(c => (c.Name, termIndex, c.Values)));
        }

        var factorColumns = factors.Select(f => Components(f, rows)).ToArray();
        for (var termIndex = 0; termIndex < spec.Terms.Count; termIndex++)
        {
            var term = spec.Terms[termIndex];
            IEnumerable<(string Name, double[] Values)> products = [(string.Empty, Enumerable.Repeat(1.0, rows.Length).ToArray())];
            foreach (var f in term.Factors)
            {
                products = products.SelectMany(p => factorColumns[f].Select(c => (p.Name.Length == 0 ? c.Name : p.Name + ":" + c.Name, Multiply(p.Values, c.Values)))).ToList();
            }

            columns.AddRange(products.Select(p => (p.Name, termIndex, p.Values)));
        }

        var x = new double[rows.Length, columns.Count];
        for (var j = 0; j < columns.Count; j++)
        {
            for (var i = 0; i < rows.Length; i++)
            {
                x[i, j] = columns[j].Values[i];
            }
        }

        return new DesignMatrix(x, columns.Select(c => c.Name).ToArray(), columns.Select(c => c.Term).ToArray(), termNames);
    }

    private static List<(string Name, double[] Values)> Components(FactorColumn factor, int[] rows, bool forceCategorical = false)
    {
        if (factor.LevelValues is { } levelValues && !forceCategorical)
        {
            var raw = rows.Select(r => levelValues[factor.Codes[r]]).ToArray();
            var mean = raw.Length == 0 ? 0 : raw.Average();
            return [(factor.Name, raw.Select(v => v - mean).ToArray())];
        }

        var present = rows.Select(r => factor.Codes[r]).Distinct().Order().ToArray();
        return present.Skip(1).Select(level => (factor.Name + "[" + factor.Levels[level] + "]",
            rows.Select(r => factor.Codes[r] == level ? 1.0 : 0.0).ToArray())).ToList();
    }

    private static double[] Multiply(double[] a, double[] b)
    {
        var result = new double[a.Length];
        for (var i = 0; i < a.Length; i++)
        {
            result[i] = a[i] * b[i];
        }

        return result;
    }
}
