using FsCheck;
using FsCheck.Fluent;

namespace CellCheck.Core.Tests.Properties;

/// <summary>
/// Inputs for the property tests. Values are dyadic (k/1024, |k| ≤ 10⁶), shifts integers up to ±2³⁰ (about 10⁹)
/// and scales powers of two from 2⁻⁴ to 2²⁰: then y = scale · x + shift needs at most 45 significant bits and is
/// computed exactly, so any difference between the statistics of x and y is the method's own rounding, which is
/// what the invariance tests measure (a sum of squares taken before centring loses about 10⁻⁴ here). Distinct
/// values differ by at least 2⁻¹⁴, which at 2³⁰ is 2⁻⁴⁴ relative: above the 2⁻⁴⁷ within which the methods call
/// values equal up to rounding, so "no spread" means the same before and after the transform.
/// </summary>
public static class Generators
{
    private static readonly Gen<double> Dyadic = Gen.Choose(-1_000_000, 1_000_000).Select(k => k / 1024.0);

    private static Gen<double[]> Sample(int min, int max) =>
        from n in Gen.Choose(min, max)
        from values in Gen.ArrayOf(Dyadic, n)
        select values;

    private static Gen<double[][]> Groups(int minSize) =>
        from k in Gen.Choose(2, 6)
        from groups in Gen.ArrayOf(Sample(minSize, 15), k)
        select groups;

    private static readonly Gen<double> Shift = Gen.Choose(-(1 << 30), 1 << 30).Select(s => (double)s);

    private static readonly Gen<double> ExactScale = Gen.Choose(-4, 20).Select(e => Math.ScaleB(1.0, e));

    public static Arbitrary<Transformed> Transformed() => Arb.From(
        from groups in Groups(2)
        from shift in Shift
        from scale in ExactScale
        select new Transformed(groups, shift, scale));

    public static Arbitrary<Permuted> Permuted() => Arb.From(
        from groups in Groups(1)
        from shuffled in Gen.CollectToArray(groups.Select(g => Gen.Shuffle(g)))
        select new Permuted(groups, shuffled));

    /// <summary>Any finite doubles, from subnormal to ±1.7e308, with ties and repeated values mixed in.</summary>
    public static Arbitrary<double[][]> FiniteGroups()
    {
        var finite = Gen.OneOf(
            Dyadic,
            from m in Gen.Choose(-1_000_000, 1_000_000)
            from e in Gen.Choose(-1074, 1023)
            select Math.Clamp(Math.ScaleB(m / 1e6, e), double.MinValue, double.MaxValue),
            Gen.Elements(0.0, -0.0, double.Epsilon, double.MaxValue, double.MinValue, 1e-300, 1e300, 1e100, -1e100, 1.0, 1.0 + 1e-15));
        var sample = from n in Gen.Choose(0, 20) from values in Gen.ArrayOf(finite, n) select values;
        return Arb.From(from k in Gen.Choose(1, 5) from groups in Gen.ArrayOf(sample, k) select groups);
    }
}
