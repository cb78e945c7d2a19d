using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>NIST StRD one-way ANOVA data sets against their certified values (each file's header, lines 41-47).</summary>
public sealed class OneWayAnovaNistTests
{
    public static TheoryData<string, double[]> Certified => new()
    {
        // certified: SS between, SS within, MS between, MS within, F, R², residual SD; df in the tests below
        { "SiRstvt", [5.11462616000000E-02, 2.16636560000000E-01, 1.27865654000000E-02, 1.08318280000000E-02, 1.18046237440255E+00, 1.90999039051129E-01, 1.04076068334656E-01] },
        { "SmLs01t", [1.68, 1.8, 0.21, 0.01, 21.0, 4.82758620689655E-01, 0.1] },
        { "SmLs02t", [16.08, 18.0, 2.01, 0.01, 201.0, 4.71830985915493E-01, 0.1] },
        { "SmLs03t", [160.08, 180.0, 20.01, 0.01, 2001.0, 4.70712773465067E-01, 0.1] },
        { "SmLs04t", [1.68, 1.8, 0.21, 0.01, 21.0, 4.82758620689655E-01, 0.1] },
        { "SmLs05t", [16.08, 18.0, 2.01, 0.01, 201.0, 4.71830985915493E-01, 0.1] },
        { "SmLs06t", [160.08, 180.0, 20.01, 0.01, 2001.0, 4.70712773465067E-01, 0.1] },
        { "SmLs07t", [1.68, 1.8, 0.21, 0.01, 21.0, 4.82758620689655E-01, 0.1] },
        { "SmLs08t", [16.08, 18.0, 2.01, 0.01, 201.0, 4.71830985915493E-01, 0.1] },
        { "SmLs09t", [160.08, 180.0, 20.01, 0.01, 2001.0, 4.70712773465067E-01, 0.1] },
        { "AtmWtAgt", [3.63834187500000E-09, 1.04951729166667E-08, 3.63834187500000E-09, 2.28155932971014E-10, 1.59467335677930E+01, 2.57426544538321E-01, 1.51048314446410E-05] },
    };

    [Theory]
    [MemberData(nameof(Certified))]
    public void Centred_input_reproduces_every_certified_value(string file, double[] certified)
    {
        // Certified values carry 15 significant digits, so they are themselves rounded by up to 5e-15 relative
        // (AtmWtAgt SS within 1.04951729166667E-08 stands for 1.0495172916666666…E-08); LRE ≥ 14 is every digit
        // the certificate supports. Observed: LRE ≥ 14.5 on all files.
        var t = OneWayAnova.Compute(NistAnovaFile.Load(file).ParseCentred());

        AssertLre(certified, t, 14.0);
    }

    [Theory]
    // Plain double parsing rounds each value by up to 2⁻⁵³|y|; relative to the spread of the data that is
    // ~1e-16 × |y| / 0.1. SmLs01-03 (values near 1.4): 1e-15, so 13 digits; SiRstvt (near 196, spread 0.1): 2e-13,
    // so 12 digits. Observed LRE 14.9 and 12.9.
    [InlineData("SiRstvt", 12.0)]
    [InlineData("SmLs01t", 13.0)]
    [InlineData("SmLs02t", 13.0)]
    [InlineData("SmLs03t", 13.0)]
    // 7 constant leading digits (values near 1e6 and 107.868, spread ~1e-1 and ~1e-5): the input rounding alone is
    // ~1e-10 relative to the spread, so 9 digits is what double input permits. Observed LRE 9.3 and 10.9.
    [InlineData("SmLs04t", 9.0)]
    [InlineData("SmLs05t", 9.0)]
    [InlineData("SmLs06t", 9.0)]
    [InlineData("AtmWtAgt", 9.0)]
    public void Plain_double_input_keeps_the_digits_that_double_input_permits(string file, double minimumLre)
    {
        var certified = Certified.Single(row => (string)row[0] == file)[1] as double[];
        var t = OneWayAnova.Compute(NistAnovaFile.Load(file).ParseAsDouble());

        AssertLre(certified!, t, minimumLre);
    }

    [Theory]
    // SiRstvt and SmLs01-03: df 4/20 and 8 / 180, 1800, 18000 (certified); AtmWtAg 1/46
    [InlineData("SiRstvt", 4, 20)]
    [InlineData("SmLs01t", 8, 180)]
    [InlineData("SmLs06t", 8, 18000)]
    [InlineData("SmLs08t", 8, 1800)]
    [InlineData("AtmWtAgt", 1, 46)]
    public void Degrees_of_freedom_are_the_certified_ones(string file, int dfBetween, int dfWithin)
    {
        var t = OneWayAnova.Compute(NistAnovaFile.Load(file).ParseCentred());

        Assert.Equal(dfBetween, t.DfBetween);
        Assert.Equal(dfWithin, t.DfWithin);
    }

    [Theory]
    // R 4.2.2 pf(F, df1, df2, lower.tail = FALSE) at the certified F (Fixtures/check-values.R). The far tails
    // (1e-22, 1e-243) check that the p-value is not formed as 1 − CDF. Tolerance 1e-9, the project's target for p-values
    // from MathNet functions; observed ≤ 7e-13.
    [InlineData("SmLs01t", 2.5832643372689516e-22)]
    [InlineData("SmLs08t", 4.0371418857532225e-243)]
    [InlineData("SiRstvt", 0.34944749340219283)]
    [InlineData("AtmWtAgt", 0.00023268444833892586)]
    public void P_value_matches_R_at_the_certified_F(string file, double p)
    {
        var t = OneWayAnova.Compute(NistAnovaFile.Load(file).ParseCentred());

        Accuracy.AssertRelative(p, t.P, 1e-9);
    }

    private static void AssertLre(double[] certified, AnovaTable t, double minimumLre)
    {
        double[] got = [t.SsBetween, t.SsWithin, t.MsBetween, t.MsWithin, t.F, t.RSquared, t.ResidualSd];
        string[] names = ["SS between", "SS within", "MS between", "MS within", "F", "R²", "residual SD"];
        for (var i = 0; i < got.Length; i++)
        {
            var lre = Accuracy.Lre(certified[i], got[i]);
            Assert.True(lre >= minimumLre, $"{names[i]}: certified {certified[i]:R}, got {got[i]:R}, LRE {lre:F2} < {minimumLre}");
        }
    }
}
