using CellCheck.Core.Calibration;

namespace CellCheck.Core.Resolution;

/// <summary>
/// A resolution-aware p-value for the primary normality check: the statistic's null distribution is simulated from the
/// fitted values plus normal errors with the residual SD, each simulated value rounded to the recording step as the
/// data were, so ties and granularity that rounding alone creates do not count as departures (a parametric bootstrap
/// of the test; Monte Carlo p = (1 + #{simulated ≥ observed}) / (draws + 1)).
/// </summary>
public static class RoundedNormality
{
    public static double PValue(INullPlan plan, PrimaryChoice choice, double[] fitted, double sigma, double step, double observed, int draws, int seed)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(fitted);
        if (double.IsNaN(observed) || !(sigma > 0) || !(step > 0))
        {
            return double.NaN;
        }

        var exceed = 0;
        var done = 0;
        var gate = new object();
        Parallel.For(0, draws, () => new SimulationWorkspace(plan, choice), (i, _, w) =>
        {
            DrawGenerator.Fill(plan.CellStarts, [], Departure.None, seed, i, w.Values);
            for (var r = 0; r < w.Values.Length; r++)
            {
                w.Values[r] = Math.Round((fitted[r] + (sigma * w.Values[r])) / step) * step;
            }

            plan.Residualize(w.Values, w.Residuals, w.Studentized);
            var stat = w.Evaluator.Stats(w.Residuals, w.Studentized).Normality;
            if (double.IsFinite(stat))
            {
                lock (gate)
                {
                    done++;
                    exceed += stat >= observed ? 1 : 0;
                }
            }

            return w;
        }, _ => { });
        return (1.0 + exceed) / (done + 1.0);
    }
}
