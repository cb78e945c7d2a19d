using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class ExactCentringTests
{
    [Fact]
    public void Values_are_shifted_by_the_first_value_exactly()
    {
        // decimal arithmetic: 1000000000000.3 − 1000000000000.4 = −0.1 exactly, which then rounds once to double
        var centred = ExactCentring.Centre([1000000000000.4m, 1000000000000.3m, 1000000000000.6m], out var origin);

        Assert.Equal(1000000000000.4m, origin);
        Assert.Equal([0.0, -0.1, 0.2], centred);
    }

    [Fact]
    public void An_empty_span_has_origin_zero()
    {
        var centred = ExactCentring.Centre([], out var origin);

        Assert.Equal(0m, origin);
        Assert.Empty(centred);
    }

    [Fact]
    public void SmLs09_loses_digits_when_parsed_as_double_and_keeps_them_when_centred()
    {
        // NIST StRD SmLs09 certified SS within 180 and F 2001 (file header). Parsed as double, 1000000000000.x
        // rounds to a multiple of 2⁻¹³ ≈ 1.2e-4 — about 1e-3 of the data's spread of 0.1 — so few digits can
        // survive (observed LRE 3.3). Centred in decimal, the values are exact tenths rounded once, so the result
        // should be good to near double precision; we require LRE ≥ 9 (relative error ≤ 1e-9), the usual mark of a
        // numerically sound ANOVA on this "higher difficulty" file (observed LRE 15.6).
        var file = NistAnovaFile.Load("SmLs09t");

        var naive = OneWayAnova.Compute(file.ParseAsDouble());
        var centred = OneWayAnova.Compute(file.ParseCentred());

        Assert.True(Accuracy.Lre(180.0, naive.SsWithin) < 5, $"naive LRE {Accuracy.Lre(180.0, naive.SsWithin):F2}");
        Assert.True(Accuracy.Lre(2001.0, naive.F) < 5, $"naive LRE {Accuracy.Lre(2001.0, naive.F):F2}");
        Assert.True(Accuracy.Lre(180.0, centred.SsWithin) >= 9);
        Assert.True(Accuracy.Lre(2001.0, centred.F) >= 9);
    }
}
