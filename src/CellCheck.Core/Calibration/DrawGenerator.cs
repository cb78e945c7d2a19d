using MathNet.Numerics.Random;

namespace CellCheck.Core.Calibration;

/// <summary>
/// Seeded simulated data for a layout of cells: standard normal errors row by row (Box-Muller on
/// MathNet's xoshiro256** generator), with an optional departure in one cell (cell <c>draw mod k</c>, so that
/// rates average over every cell). Draw i of a seed is the same whatever
/// the order or thread in which draws are made.
/// </summary>
internal static class DrawGenerator
{
    /// <summary>Lognormal shape parameter σ of the skewed-cell departure.</summary>
    public const double LognormalShape = 0.5;

    public static void Fill(int[] cellStarts, int[] eligibleCells, Departure departure, int seed, int draw, double[] values)
    {
        var random = new Xoshiro256StarStar(Mix(seed, draw), threadSafe: false);
        var rows = cellStarts[^1];
        for (var i = 0; i < rows; i++)
        {
            values[i] = Normal(random);
        }

        if (departure == Departure.None)
        {
            return;
        }

        if (departure == Departure.HeavyTails)
        {
            // t(5) = z / sqrt(chi2(5) / 5), standardised by its SD sqrt(5 / 3)
            for (var i = 0; i < rows; i++)
            {
                var chi2 = 0.0;
                for (var d = 0; d < 5; d++)
                {
                    var z = Normal(random);
                    chi2 += z * z;
                }

                values[i] = values[i] / Math.Sqrt(chi2 / 5.0) / Math.Sqrt(5.0 / 3.0);
            }

            return;
        }

        if (eligibleCells.Length == 0)
        {
            return;
        }

        // the departing cell rotates over the replicated cells with the draw index, so rates average over every cell
        var cell = eligibleCells[draw % eligibleCells.Length];
        var start = cellStarts[cell];

        var s2 = LognormalShape * LognormalShape;
        var mean = Math.Exp(s2 / 2);
        var sd = Math.Sqrt((Math.Exp(s2) - 1) * Math.Exp(s2));
        for (var i = start; i < cellStarts[cell + 1]; i++)
        {
            values[i] = departure == Departure.VarianceRatio4 ? 2.0 * values[i] : (Math.Exp(LognormalShape * values[i]) - mean) / sd;
        }
    }

    private static double Normal(Random random)
    {
        var u1 = 1.0 - random.NextDouble();
        var u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }

    /// <summary>SplitMix64 finaliser of (seed, draw), folded to a 32-bit seed.</summary>
    private static int Mix(int seed, int draw)
    {
        var z = unchecked(((ulong)(uint)seed << 32) + (ulong)(uint)draw + 0x9E3779B97F4A7C15UL);
        z = unchecked((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL);
        z = unchecked((z ^ (z >> 27)) * 0x94D049BB133111EBUL);
        z ^= z >> 31;
        return unchecked((int)(z ^ (z >> 32)));
    }
}
