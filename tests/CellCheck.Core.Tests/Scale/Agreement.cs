using System.Globalization;
using CellCheck.Core.Tests.Support;
using Xunit.Abstractions;

namespace CellCheck.Core.Tests.Scale;

/// <summary>
/// Compares CellCheck's numbers with the reference side's and writes the relative difference of each to the test output,
/// so a run with a detailed logger shows how close they are, not only that they pass.
/// </summary>
/// <remarks>
/// Why 1e-9 relative: both sides compute in double precision. The reference sums with Neumaier's compensation
/// (error about 2ε·Σ|x| ≈ 2.2e-16 relative for the sums of squares here, whatever their length); CellCheck sums about
/// a centre, mostly by the corrected two-pass formula. Even plain recursive summation of 10⁶ terms of one sign errs by at
/// most (n − 1)ε ≈ 1.1e-10 relative, and its typical error is ε√n ≈ 1e-13; the statistics are ratios, logs and smooth
/// functions of a few such sums, so rounding alone stays one to four orders of magnitude below 1e-9. A difference above
/// it means a different formula, a different set of rows or cells, a different centre or a different tie rule, not
/// rounding. Where a statistic is itself a small difference of large sums, the test says so beside its check.
/// </remarks>
internal sealed class Agreement(ITestOutputHelper output)
{
    /// <summary>The relative tolerance of every comparison (see the type's remarks for the reason).</summary>
    public const double Tolerance = 1e-9;

    /// <summary>Asserts one value within <see cref="Tolerance"/> relative (absolute when the reference is 0).</summary>
    public void Equal(string what, double expected, double actual)
    {
        var error = Accuracy.RelativeError(expected, actual);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{what}: reference {expected:R}, CellCheck {actual:R}, relative difference {error:E2}"));
        Assert.True(error <= Tolerance, $"{what}: reference {expected:R}, CellCheck {actual:R}, relative difference {error:E2} > {Tolerance:E0}");
    }

    /// <summary>Asserts every pair within <see cref="Tolerance"/> relative; writes the count and the largest difference.</summary>
    public void AllEqual<TWhere>(string what, IEnumerable<(TWhere Where, double Expected, double Actual)> pairs) =>
        AllWithin(what, pairs.Select(p => (p.Where, p.Expected, p.Actual, Accuracy.RelativeError(p.Expected, p.Actual))), "relative");

    /// <summary>Asserts |actual − expected| ≤ <see cref="Tolerance"/> · scale for every pair (a difference measured on a
    /// stated scale, for quantities that pass through zero).</summary>
    public void AllEqualOnScale<TWhere>(string what, double scale, IEnumerable<(TWhere Where, double Expected, double Actual)> pairs) =>
        AllWithin(what, pairs.Select(p => (p.Where, p.Expected, p.Actual, Math.Abs(p.Actual - p.Expected) / scale)),
            "on scale " + scale.ToString("G6", CultureInfo.InvariantCulture));

    private void AllWithin<TWhere>(string what, IEnumerable<(TWhere Where, double Expected, double Actual, double Error)> rows, string kind)
    {
        var list = rows.ToList();
        Assert.NotEmpty(list);
        var worst = list.MaxBy(r => r.Error);
        var failures = list.Count(r => !(r.Error <= Tolerance));
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{what}: {list.Count} compared, largest difference ({kind}) {worst.Error:E2} at {worst.Where} (reference {worst.Expected:R}, CellCheck {worst.Actual:R})"));
        Assert.True(failures == 0, string.Create(CultureInfo.InvariantCulture,
            $"{what}: {failures} of {list.Count} differ by more than {Tolerance:E0} ({kind}); largest {worst.Error:E2} at {worst.Where}"));
    }
}
