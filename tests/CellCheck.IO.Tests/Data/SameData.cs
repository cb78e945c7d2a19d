using System.Runtime.InteropServices;
using CellCheck.Core.Data;

namespace CellCheck.IO.Tests.Data;

/// <summary>Asserts that two reads of a data file gave the same result, field by field, doubles bit for bit.</summary>
internal static class SameData
{
    public static void Assert(LoadResult<DesignData> expected, LoadResult<DesignData> actual)
    {
        Xunit.Assert.Equal(expected.Problems, actual.Problems);
        Xunit.Assert.Equal(expected.Ok, actual.Ok);
        if (expected.Value is not { } e)
        {
            return;
        }

        var a = actual.Value!;
        Factors(e.Factors, a.Factors);
        Factors(e.Blocks, a.Blocks);
        Xunit.Assert.Equal(e.Responses.Count, a.Responses.Count);
        for (var r = 0; r < e.Responses.Count; r++)
        {
            var (x, y) = (e.Responses[r], a.Responses[r]);
            Xunit.Assert.Equal((x.Name, x.Unit, x.Decimals), (y.Name, y.Unit, y.Decimals));
            Xunit.Assert.Equal(BitConverter.DoubleToInt64Bits(x.Origin), BitConverter.DoubleToInt64Bits(y.Origin));
            Bits(x.Values, y.Values, x.Name);
            Xunit.Assert.Equal(e.Excluded[r], a.Excluded[r]);
        }

        Xunit.Assert.Equal(e.SourceLines.ToArray(), a.SourceLines.ToArray());
        Bits(e.RunOrder?.ToArray(), a.RunOrder?.ToArray(), "run order");
        Xunit.Assert.Equal((e.RunOrderColumn, e.FilteredOut), (a.RunOrderColumn, a.FilteredOut));
    }

    private static void Factors(IReadOnlyList<FactorColumn> expected, IReadOnlyList<FactorColumn> actual)
    {
        Xunit.Assert.Equal(expected.Count, actual.Count);
        for (var f = 0; f < expected.Count; f++)
        {
            Xunit.Assert.Equal(expected[f].Name, actual[f].Name);
            Xunit.Assert.Equal(expected[f].Levels, actual[f].Levels);
            Xunit.Assert.Equal(expected[f].Codes.ToArray(), actual[f].Codes.ToArray());
            Bits(expected[f].LevelValues, actual[f].LevelValues, expected[f].Name);
        }
    }

    private static void Bits(double[]? expected, double[]? actual, string what)
    {
        Xunit.Assert.Equal(expected is null, actual is null);
        if (expected is null)
        {
            return;
        }

        Xunit.Assert.Equal(expected.Length, actual!.Length);
        var x = MemoryMarshal.Cast<double, long>(expected);
        var y = MemoryMarshal.Cast<double, long>(actual);
        var first = x.CommonPrefixLength(y);
        Xunit.Assert.True(first == x.Length, $"{what}: row {first} differs ({(first < x.Length ? expected[first] : 0)} against {(first < x.Length ? actual[first] : 0)})");
    }
}
