using CellCheck.Core.Planning;
using CellCheck.IO.Planning;

namespace CellCheck.IO.Tests.Planning;

public sealed class PlanRequestReaderTests
{
    [Theory]
    [InlineData("0.5", EffectScale.Difference, 0.5)]
    [InlineData(" 2e-1 ", EffectScale.Difference, 0.2)]
    [InlineData("f=0.25", EffectScale.CohenF, 0.25)]
    [InlineData("F=0.4", EffectScale.CohenF, 0.4)]
    public void Effects_are_read_as_differences_or_cohens_f(string text, EffectScale scale, double value)
    {
        var r = PlanRequestReader.Read(new PlanArguments(text), 0.05);
        Assert.True(r.Ok);
        Assert.Equal(new SmallestEffect(scale, value), r.Value!.Effect);
    }

    [Fact]
    public void Defaults_follow_the_design_file_and_the_power()
    {
        var r = PlanRequestReader.Read(new PlanArguments("1", Power: 0.9), 0.01).Value!;
        Assert.Equal((0.01, 0.9, 0.9, 200), (r.Alpha, r.Power, r.CheckPower, r.Draws));
        Assert.Null(r.Sd);
    }

    [Fact]
    public void Every_bad_option_is_reported_at_once_with_its_code()
    {
        var r = PlanRequestReader.Read(new PlanArguments("-1", Sd: -2, Power: 0.01, Draws: 1), 0.05);
        Assert.False(r.Ok);
        Assert.Equal(
            [ProblemCodes.PlanBadEffect, ProblemCodes.PlanBadSd, ProblemCodes.PlanBadPower, ProblemCodes.PlanBadPower, ProblemCodes.PlanBadDraws],
            r.Problems.Select(p => p.Code).ToArray());
        Assert.All(r.Problems, p => Assert.StartsWith(PlanRequestReader.CommandLine, p.Location, StringComparison.Ordinal));
    }

    [Fact]
    public void A_missing_effect_says_how_to_state_one()
    {
        var p = Assert.Single(PlanRequestReader.Read(new PlanArguments(null), 0.05).Problems);
        Assert.Equal(ProblemCodes.PlanMissingEffect, p.Code);
        Assert.Contains("--effect f=0.25", p.Fix, StringComparison.Ordinal);
    }
}
