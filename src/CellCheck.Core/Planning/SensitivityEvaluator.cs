using CellCheck.Core.Statistics;

namespace CellCheck.Core.Planning;

/// <summary>
/// Runs every test of <see cref="SensitivityChecks.All"/> on one simulated data set's residuals, as the report runs
/// them: within-cell tests on each cell's residuals with p adjusted across the testable cells (a flag in any cell
/// counts), pooled tests on the internally studentized residuals that exist, spread tests on the cells' residuals, all
/// with their asymptotic p-values at alpha. One instance per thread: it owns its buffers.
/// </summary>
internal sealed class SensitivityEvaluator(int[] cellStarts, double alpha, AdjustMethod adjust)
{
    public const sbyte Flag = 1;
    public const sbyte Pass = 0;
    public const sbyte NotTestable = -1;

    private readonly double[] _usable = new double[cellStarts[^1]];
    private readonly double[] _cellP = new double[cellStarts.Length - 1];

    /// <summary>Reason of each test that was not testable in the last evaluation (null otherwise).</summary>
    public string?[] Reasons { get; } = new string?[SensitivityChecks.All.Count];

    /// <summary>Evaluates the normality tests (indices 0-4) and/or the spread tests (5-9) into <paramref name="outcome"/>.</summary>
    public void Evaluate(double[] residuals, double[] studentized, bool normality, bool spread, sbyte[] outcome)
    {
        if (normality)
        {
            WithinCells(residuals, 0, ShapiroWilk.Test, outcome);
            WithinCells(residuals, 1, AndersonDarling.Test, outcome);
            var m = 0;
            foreach (var r in studentized)
            {
                if (double.IsFinite(r))
                {
                    _usable[m++] = r;
                }
            }

            var pooled = _usable.AsSpan(0, m);
            Record(2, ShapiroWilk.Test(pooled), outcome);
            Record(3, AndersonDarling.Test(pooled), outcome);
            Record(4, DagostinoPearson.Test(pooled), outcome);
        }

        if (spread)
        {
            var cells = new GroupedValues(residuals, cellStarts);
            Record(5, Levene.Test(cells), outcome);
            Record(6, BrownForsythe.Test(cells), outcome);
            Record(7, BrownForsytheZerosRemoved.Test(cells), outcome);
            Record(8, Bartlett.Test(cells), outcome);
            Record(9, FlignerKilleen.Test(cells), outcome);
        }
    }

    private delegate TestOutcome SampleTest(ReadOnlySpan<double> sample);

    private void WithinCells(double[] residuals, int index, SampleTest test, sbyte[] outcome)
    {
        string? reason = null;
        var testable = 0;
        for (var c = 0; c < _cellP.Length; c++)
        {
            var o = test(residuals.AsSpan(cellStarts[c], cellStarts[c + 1] - cellStarts[c]));
            _cellP[c] = o.IsTestable ? o.P : double.NaN;
            testable += o.IsTestable ? 1 : 0;
            reason ??= o.Reason;
        }

        if (testable == 0)
        {
            outcome[index] = NotTestable;
            Reasons[index] = reason ?? NotTestableReason.TooFewValues;
            return;
        }

        Reasons[index] = null;
        outcome[index] = Pass;
        foreach (var p in PValueAdjustment.Adjust(_cellP, adjust))
        {
            if (p < alpha)
            {
                outcome[index] = Flag;
                break;
            }
        }
    }

    private void Record(int index, TestOutcome o, sbyte[] outcome)
    {
        Reasons[index] = o.Reason;
        outcome[index] = !o.IsTestable ? NotTestable : o.P < alpha ? Flag : Pass;
    }
}
