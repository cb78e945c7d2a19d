using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Residuals;

/// <summary>
/// The cell-means model y_ij = μ_i + e_ij: residual = value − cell mean, leverage 1/n_i, pooled variance
/// s² = Σ_i Σ_j e_ij² / (N − k), internally studentized residual e_ij / (s·√(1 − 1/n_i)).
/// Singleton cells have leverage 1: residual 0 and studentized residual undefined (NaN).
/// </summary>
/// <param name="note">Why the cell-means model stands in for a declared model (null when it is the declared model).</param>
public sealed class CellMeansResiduals(string? note = null) : IResidualSource
{
    public string Name => "cell-means";

    public ResidualSet Compute(CellPartition partition)
    {
        ArgumentNullException.ThrowIfNull(partition);
        var grouped = partition.Values;
        var residuals = new double[grouped.Count];
        var fitted = new double[grouped.Count];
        var ss = 0.0;
        for (var c = 0; c < grouped.GroupCount; c++)
        {
            var cell = grouped.Group(c);
            var mean = Descriptive.Mean(cell);
            var start = grouped.Starts[c];
            for (var j = 0; j < cell.Length; j++)
            {
                fitted[start + j] = mean;
                residuals[start + j] = cell[j] - mean;
            }

            ss += Descriptive.SumOfSquares(cell, mean);
        }

        var df = grouped.Count - grouped.GroupCount;
        var s = df > 0 ? Math.Sqrt(ss / df) : double.NaN;
        var studentized = new double[grouped.Count];
        for (var c = 0; c < grouped.GroupCount; c++)
        {
            var n = grouped.Size(c);
            var scale = n > 1 && s > 0 ? s * Math.Sqrt(1.0 - (1.0 / n)) : double.NaN;
            for (var i = grouped.Starts[c]; i < grouped.Starts[c + 1]; i++)
            {
                studentized[i] = residuals[i] / scale;
            }
        }

        var plan = new CellMeansPlan(new DesignShape(Enumerable.Range(0, grouped.GroupCount).Select(grouped.Size)));
        return new ResidualSet(Name, residuals, fitted, studentized, s, df, plan, withinCellShift: true)
        {
            Diagnostics = Diagnose(partition, residuals, ss, df),
        };
    }

    /// <summary>Leverage 1/n_i; external studentized e / (s_(i) √(1 − h)) with s_(i)² = (RSS − e²/(1 − h)) / (df − 1);
    /// Cook's distance r² h / (k (1 − h)) with k cells (Cook 1977). NaN for singletons.</summary>
    private ResidualDiagnostics Diagnose(CellPartition partition, double[] residuals, double rss, int df)
    {
        var grouped = partition.Values;
        var n = residuals.Length;
        var leverage = new double[n];
        var external = new double[n];
        var cooks = new double[n];
        var k = grouped.GroupCount;
        var s = df > 0 ? Math.Sqrt(rss / df) : double.NaN;
        for (var c = 0; c < k; c++)
        {
            var h = 1.0 / grouped.Size(c);
            for (var i = grouped.Starts[c]; i < grouped.Starts[c + 1]; i++)
            {
                leverage[i] = h;
                if (h >= 1 || df < 2 || !(s > 0))
                {
                    external[i] = double.NaN;
                    cooks[i] = double.NaN;
                    continue;
                }

                var e = residuals[i];
                var deleted = Math.Sqrt(Math.Max(0, (rss - (e * e / (1 - h))) / (df - 1)));
                external[i] = e / (deleted * Math.Sqrt(1 - h));
                var r = e / (s * Math.Sqrt(1 - h));
                cooks[i] = r * r * h / (k * (1 - h));
            }
        }

        var terms = Models.ModelSpec.Full(partition.Factors.Count).Terms.Select(t => t.Name(partition.Factors)).ToArray();
        return new ResidualDiagnostics(leverage, external, cooks, new Models.ModelInfo("cell-means", terms, k, k, df, [], []) { Note = note });
    }
}
