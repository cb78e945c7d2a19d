namespace CellCheck.Core.Plots;

/// <summary>
/// Axis ranges and ticks: the data range padded on both sides, ticks at round steps of 1, 2, 2.5 or 5 times a power
/// of ten (about five of them), labelled with as many decimals as the step needs.
/// </summary>
public static class AxisScale
{
    /// <summary>Share of the range added on each side.</summary>
    public const double Padding = 0.06;

    /// <summary>A linear axis showing [lo, hi] (non-finite bounds are ignored; an empty or zero range is widened).</summary>
    public static Axis Linear(string label, double lo, double hi, int ticks = 5)
    {
        (lo, hi) = Widen(lo, hi);
        var pad = (hi - lo) * Padding;
        var min = lo - pad;
        var max = hi + pad;
        return new Axis(label, min, max, LinearTicks(min, max, ticks));
    }

    /// <summary>A linear axis on exactly [min, max], with no padding.</summary>
    public static Axis Exact(string label, double min, double max, int ticks = 5) =>
        new(label, min, max, LinearTicks(min, max, ticks));

    /// <summary>
    /// A log axis for positive data in [lo, hi]: positions are log10 of the data, ticks at round data values.
    /// </summary>
    public static Axis Log10(string label, double lo, double hi)
    {
        if (!(lo > 0) || !(hi > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(lo), "log axes need positive values");
        }

        var (a, b) = Widen(Math.Log10(lo), Math.Log10(hi));
        var pad = (b - a) * Padding;
        var min = a - pad;
        var max = b + pad;
        return new Axis(label, min, max, LogTicks(min, max));
    }

    /// <summary>Ticks of a log axis spanning [min, max] in log10 units: powers of ten across three decades or more,
    /// else across a decade or more the coarser of 1-2-5 and 1-1.5-2-3-5-7 times powers of ten that gives three ticks; over
    /// less than a decade (or when neither gives three) round linear steps of the data values.</summary>
    private static List<Tick> LogTicks(double min, double max)
    {
        double[][] sets = max - min >= 3 ? [[1]] : [[1, 2, 5], [1, 1.5, 2, 3, 5, 7]];
        foreach (var set in max - min >= 1 ? sets : [])
        {
            var ticks = new List<Tick>();
            for (var e = (int)Math.Floor(min); e <= (int)Math.Ceiling(max); e++)
            {
                foreach (var m in set)
                {
                    var v = m * Math.Pow(10, e);
                    var at = Math.Log10(v);
                    if (at >= min - 1e-12 && at <= max + 1e-12)
                    {
                        ticks.Add(new Tick(at, PlotText.Value(v, 3)));
                    }
                }
            }

            if (ticks.Count >= 3)
            {
                return ticks;
            }
        }

        return [.. LinearTicks(Math.Pow(10, min), Math.Pow(10, max)).Where(t => t.Value > 0).Select(t => new Tick(Math.Log10(t.Value), t.Label))];
    }

    /// <summary>Round ticks within [min, max], about <paramref name="count"/> of them.</summary>
    public static IReadOnlyList<Tick> LinearTicks(double min, double max, int count = 5)
    {
        var step = NiceStep((max - min) / Math.Max(1, count - 1));
        if (Math.Floor((max / step) + 1e-9) - Math.Ceiling((min / step) - 1e-9) + 1 < Math.Max(3, count - 2))
        {
            step = SmallerStep(step);
        }

        var decimals = Decimals(step);
        var first = Math.Ceiling((min / step) - 1e-9);
        var ticks = new List<Tick>();
        for (var k = first; (k * step) <= max + (step * 1e-9); k++)
        {
            var v = Math.Round(k * step, Math.Min(15, Math.Max(0, decimals + 2)));
            ticks.Add(new Tick(v, PlotText.Fixed(v, decimals)));
        }

        return ticks;
    }

    /// <summary>The smallest of 1, 2, 2.5, 5 or 10 times a power of ten at or above <paramref name="raw"/>.</summary>
    public static double NiceStep(double raw)
    {
        if (!(raw > 0) || !double.IsFinite(raw))
        {
            return 1.0;
        }

        var power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        foreach (var m in (double[])[1, 2, 2.5, 5, 10])
        {
            if (m * power >= raw * (1 - 1e-9))
            {
                return m * power;
            }
        }

        return 10 * power;
    }

    /// <summary>The next smaller of the steps 1, 2, 2.5, 5 times a power of ten.</summary>
    private static double SmallerStep(double step)
    {
        var power = Math.Pow(10, Math.Floor(Math.Log10(step) + 1e-9));
        var m = step / power;
        return m switch
        {
            > 4.9 => 2.5 * power,
            > 2.4 => 2 * power,
            > 1.9 => power,
            _ => 0.5 * power,
        };
    }

    private static int Decimals(double step)
    {
        var d = 0;
        while (d < 12 && Math.Abs((step * Math.Pow(10, d)) - Math.Round(step * Math.Pow(10, d))) > 1e-9 * step * Math.Pow(10, d))
        {
            d++;
        }

        return d;
    }

    private static (double Lo, double Hi) Widen(double lo, double hi)
    {
        if (!double.IsFinite(lo) || !double.IsFinite(hi) || lo > hi)
        {
            return (-1, 1);
        }

        if (hi - lo <= Math.Max(Math.Abs(lo), Math.Abs(hi)) * 1e-12)
        {
            var half = Math.Abs(lo) > 0 ? Math.Abs(lo) * 0.1 : 1.0;
            return (lo - half, hi + half);
        }

        return (lo, hi);
    }
}
