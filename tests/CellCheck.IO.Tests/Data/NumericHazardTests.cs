using System.Globalization;
using CellCheck.Core.Analysis;
using CellCheck.IO.Data;
using CellCheck.IO.Design;

namespace CellCheck.IO.Tests.Data;

/// <summary>Numbers that would poison the arithmetic are located exclusions, never propagated into a verdict.</summary>
public sealed class NumericHazardTests
{
    [Fact]
    public void Not_finite_and_out_of_range_values_are_excluded_with_line_and_code()
    {
        using var t = new TempDesign("a,b,y\n1,x,NaN\n1,x,-inf\n1,x,1e308\n1,x,-1e101\n1,x,1e-320\n1,x," + new string('9', 120) + "\n1,x,0\n1,x,1e100\n1,x,-1e-100\n");
        var d = Read(t);
        Assert.Equal([2, 3, 4, 5, 6, 7], d.Excluded[0].Select(e => e.Line));
        Assert.Equal(["not-finite", "not-finite", "out-of-range", "out-of-range", "out-of-range", "out-of-range"], d.Excluded[0].Select(e => e.Code));
        Assert.Equal(3, d.Responses[0].Values.Count(double.IsFinite));
    }

    [Fact]
    public void Values_whose_difference_leaves_decimal_range_are_taken_in_double()
    {
        // 79228162514264337593543950335 is decimal.MaxValue; the difference of the two extremes is outside decimal.
        using var t = new TempDesign("a,b,y\n1,x,-79228162514264337593543950335\n1,x,79228162514264337593543950335\n");
        var y = Read(t).Responses[0];
        // Tolerance: one part in 1e15 of the difference, since each value is rounded once on its way to double.
        Assert.Equal(2 * 79228162514264337593543950335.0, y.Values[1], 1e-15 * 2 * 7.9e28);
    }

    [Fact]
    public void A_billion_plus_small_noise_gives_exactly_the_checks_of_the_noise_alone()
    {
        // Catastrophic cancellation (NIST StRD SmLs07-09 use 1e12 + small digits): the reader subtracts the first
        // value in exact decimal arithmetic, so shifted data reach the checks as the same doubles and every statistic
        // is identical, not merely close.
        var noise = Enumerable.Range(0, 24).Select(i => (Cell: i % 3, Value: ((i * 37) % 17 - 8) * 0.000001m)).ToList();
        string Data(decimal shift) => "a,b,y\n" + string.Concat(noise.Select(n => $"{n.Cell},x,{(n.Value + shift).ToString(CultureInfo.InvariantCulture)}\n"));
        using var small = new TempDesign(Data(0.5m));
        using var shifted = new TempDesign(Data(1_000_000_000.5m));
        var a = Analyze(small);
        var b = Analyze(shifted);
        Assert.Equal(a.Cells.Select(c => c.Sd), b.Cells.Select(c => c.Sd));
        Assert.Equal(a.Spread.Checks.Select(c => c.Statistic), b.Spread.Checks.Select(c => c.Statistic));
        Assert.Equal(a.Pooled.Checks.Select(c => c.Statistic), b.Pooled.Checks.Select(c => c.Statistic));
        Assert.All(b.Cells, c => Assert.True(c.Sd > 0));
    }

    [Fact]
    public void A_single_row_and_cells_of_identical_values_give_not_testable_reasons_not_numbers()
    {
        using var single = new TempDesign("a,b,y\n1,x,2\n");
        var one = Analyze(single);
        Assert.Equal(CheckStatus.NotTestable, one.Verdict.Status);
        using var same = new TempDesign("a,b,y\n1,x,2\n1,x,2\n1,x,2\n2,x,5\n2,x,5\n2,x,5\n");
        var flat = Analyze(same);
        Assert.All(flat.Cells.SelectMany(c => c.Checks), c => Assert.True(c.Status == CheckStatus.NotTestable && c.Reason is not null, c.Check));
        Assert.All(flat.Verdict.Assumptions, a => Assert.NotEqual(CheckStatus.Flag, a.Status));
    }

    [Fact]
    public void A_response_without_any_usable_value_in_a_fitted_model_is_not_testable()
    {
        // Found by the fuzzer: a numeric factor makes the model a linear fit, which had no rows to fit.
        using var t = new TempDesign("a,b,y\n1,x,NA\n2,y,NaN\n3,x,\n", "data: data.csv\nfactors: [{column: a, kind: numeric}]\nblocks: [b]\nresponses: [y]\n");
        var r = Analyze(t);
        Assert.Equal(0, r.RowsUsed);
        Assert.Equal(CheckStatus.NotTestable, r.Verdict.Status);
    }

    private static Core.Data.DesignData Read(TempDesign t)
    {
        var design = DesignReader.Read(t.DesignPath);
        Assert.True(design.Ok);
        var data = DataReader.Read(design.Value!);
        Assert.True(data.Ok, string.Join("; ", data.Problems.Select(p => p.What)));
        return data.Value!;
    }

    private static ResponseReport Analyze(TempDesign t)
    {
        var run = CheckRun.Run(t.DesignPath);
        Assert.True(run.Ok, string.Join("; ", run.Problems.Select(p => p.What)));
        Hostile.ReportInvariants.Check(run.Value!.Report);
        return Assert.Single(run.Value.Report.Responses);
    }
}
