using CellCheck.Core.Calibration;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Models;

namespace CellCheck.Core.Residuals;

/// <summary>
/// The default blocked model, every cell of the full factorial in categorical factors plus additive blocks, fitted by
/// absorbing the cell means (<see cref="CellBlockFit"/>): the same least-squares fit as the dummy-variable regression,
/// without its n × p matrix. Used for large designs; when the blocks are confounded with the cells, or a cell of the
/// factorial is empty, the pivoted QR fit of <see cref="ModelResiduals"/> decides what is aliased instead.
/// </summary>
public sealed class CellBlockResiduals(IReadOnlyList<FactorColumn> blocks, ModelSpec spec, string name, IResidualSource fallback) : IResidualSource
{
    public string Name => name;

    public ResidualSet Compute(CellPartition partition)
    {
        ArgumentNullException.ThrowIfNull(partition);
        var complete = partition.Factors.Aggregate(1L, (product, f) => product * f.Levels.Count) == partition.CellCount;
        var codes = partition.GroupedCodes(blocks);
        var fit = complete && partition.RowOrder.Length > 0 && codes.All(c => c.AsSpan().IndexOfAnyInRange(int.MinValue, -1) < 0)
            ? CellBlockFit.Build(partition.Values.Starts, codes)
            : null;
        if (fit is null)
        {
            return fallback.Compute(partition);
        }

        var y = partition.Values.Values;
        var n = y.Length;
        var residuals = new double[n];
        fit.Residualize(y, residuals);
        var leverage = new double[n];
        var cellRss = new double[partition.CellCount];
        // cells in parallel, each into its own slots; the sum of squares is then added in cell order (deterministic)
        Parallel.For(0, partition.CellCount, c =>
        {
            var sum = 0.0;
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                leverage[i] = fit.Leverage(c, i);
                sum += residuals[i] * residuals[i];
            }

            cellRss[c] = sum;
        });
        var rss = 0.0;
        foreach (var part in cellRss)
        {
            rss += part;
        }

        var df = n - fit.Rank;
        var studentized = new double[n];
        CaseDiagnostics.ComputeInParallel(residuals, leverage, rss, df, fit.Rank, studentized, null, null);
        // fitted values, externally studentized residuals and Cook's distances on first use: only per-row output keeps them
        double[] Fitted()
        {
            var fitted = new double[n];
            for (var i = 0; i < n; i++)
            {
                fitted[i] = y[i] - residuals[i];
            }

            return fitted;
        }

        double[] External()
        {
            var external = new double[n];
            CaseDiagnostics.ComputeInParallel(residuals, leverage, rss, df, fit.Rank, null, external, null);
            return external;
        }

        double[] Cooks()
        {
            var cooks = new double[n];
            CaseDiagnostics.Compute(residuals, leverage, rss, df, fit.Rank, [], [], cooks);
            return cooks;
        }

        var s = df > 0 ? Math.Sqrt(rss / df) : double.NaN;
        var terms = spec.Terms.Select(t => t.Name(partition.Factors)).Concat(blocks.Select(b => b.Name)).ToArray();
        var info = new ModelInfo(name, terms, fit.Rank, fit.Rank, df, [], []) { Absorbed = true };
        var plan = new CellBlockPlan(fit, partition.Values.Starts, leverage, codes);
        return new ResidualSet(name, residuals, Fitted, studentized, s, df, plan)
        {
            Diagnostics = new ResidualDiagnostics(leverage, External, Cooks, info) { Absorbed = fit },
        };
    }
}
