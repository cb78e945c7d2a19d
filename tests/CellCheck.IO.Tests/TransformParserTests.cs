using CellCheck.Core.Remedies;

namespace CellCheck.IO.Tests;

public sealed class TransformParserTests
{
    [Theory]
    [InlineData("auto", null, null)]
    [InlineData("log", PowerFamily.BoxCox, 0.0)]
    [InlineData("SQRT", PowerFamily.BoxCox, 0.5)]
    [InlineData("reciprocal", PowerFamily.BoxCox, -1.0)]
    [InlineData("reciprocal-sqrt", PowerFamily.BoxCox, -0.5)]
    [InlineData("power:0.33", PowerFamily.BoxCox, 0.33)]
    [InlineData("power:-2", PowerFamily.BoxCox, -2.0)]
    [InlineData("yeo-johnson", PowerFamily.YeoJohnson, null)]
    [InlineData("yeo-johnson:1.5", PowerFamily.YeoJohnson, 1.5)]
    public void Known_transformations_are_read(string text, PowerFamily? family, double? power)
    {
        var result = TransformParser.Parse(text);
        Assert.True(result.Ok);
        Assert.Equal(family, result.Value!.Family);
        Assert.Equal(power, result.Value.Power);
    }

    [Theory]
    [InlineData("logarithm")]
    [InlineData("power:")]
    [InlineData("power:abc")]
    [InlineData("power:7")]
    [InlineData("power:NaN")]
    [InlineData("")]
    public void Unknown_transformations_are_a_located_problem(string text)
    {
        var result = TransformParser.Parse(text);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(ProblemCodes.BadTransform, problem.Code);
        Assert.Equal("--transform", problem.File);
        Assert.Contains("power:P", problem.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void A_shift_must_be_finite()
    {
        Assert.Equal(ProblemCodes.BadShift, Assert.Single(TransformParser.Parse("log", double.PositiveInfinity).Problems).Code);
        Assert.Equal(2.5, TransformParser.Parse("log", 2.5).Value!.Shift);
    }
}
