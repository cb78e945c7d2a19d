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
        var fit = complete && partition.RowOrder.Length > 0 && codes.All(c => !c.AnyMissing())
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
        var cellRss = new double[partition.CellCount];
        var cellCounts = new (int NotBelowOne, int AtLeastOne, int Usable)[partition.CellCount];
        // cells in parallel, each into its own slots; sums and counts then added in cell order (deterministic)
        Parallel.For(0, partition.CellCount, c =>
        {
            var sum = 0.0;
            var counts = (NotBelowOne: 0, AtLeastOne: 0, Usable: 0);
            for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
            {
                var h = fit.Leverage(c, i);
                counts.NotBelowOne += h < 1 - 1e-10 ? 0 : 1;
                counts.AtLeastOne += h >= 1 - 1e-10 ? 1 : 0;
                counts.Usable += 1.0 - h > CellBlockPlan.LeverageOne ? 1 : 0;
                sum += residuals[i] * residuals[i];
            }

            (cellRss[c], cellCounts[c]) = (sum, counts);
        });
        var rss = 0.0;
        var (notBelowOne, atLeastOne, usable) = (0, 0, 0);
        for (var c = 0; c < cellRss.Length; c++)
        {
            rss += cellRss[c];
            (notBelowOne, atLeastOne, usable) = (notBelowOne + cellCounts[c].NotBelowOne, atLeastOne + cellCounts[c].AtLeastOne, usable + cellCounts[c].Usable);
        }

        var df = n - fit.Rank;
        // every per-row value on first use (only per-row output keeps them): at ten million rows, 400 MB not held
        var cases = new CellBlockCases(fit, partition.Values.Starts, residuals, rss, df);
        double[] Fitted()
        {
            var fitted = new double[n];
            for (var i = 0; i < n; i++)
            {
                fitted[i] = y[i] - residuals[i];
            }

            return fitted;
        }

        var s = df > 0 ? Math.Sqrt(rss / df) : double.NaN;
        var terms = spec.Terms.Select(t => t.Name(partition.Factors)).Concat(blocks.Select(b => b.Name)).ToArray();
        var info = new ModelInfo(name, terms, fit.Rank, fit.Rank, df, [], []) { Absorbed = true };
        var plan = new CellBlockPlan(fit, partition.Values.Starts, cases.Leverage, usable, codes);
        return new ResidualSet(name, residuals, Fitted, cases.Studentized, s, df, plan)
        {
            Diagnostics = new ResidualDiagnostics(cases.Leverage, cases.StudentizedExternal, cases.CooksDistance, info)
            {
                Absorbed = fit,
                Cases = cases,
                LeverageOneRows = (notBelowOne, atLeastOne),
            },
        };
    }
}
