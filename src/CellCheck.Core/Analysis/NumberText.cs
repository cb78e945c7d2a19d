using System.Globalization;

namespace CellCheck.Core.Analysis;

/// <summary>Culture-free number formatting for findings written in words.</summary>
public static class NumberText
{
    /// <summary>A p-value for reading: three decimals, four below 0.001, "&lt; 0.0001" below that.</summary>
    public static string P(double p) => p switch
    {
        double.NaN => "n/a",
        < 0.0001 => "< 0.0001",
        < 0.001 => p.ToString("0.0000", CultureInfo.InvariantCulture),
        _ => p.ToString("0.000", CultureInfo.InvariantCulture),
    };

    /// <summary>A general value with up to <paramref name="significant"/> significant digits.</summary>
    public static string Value(double x, int significant = 4) =>
        double.IsNaN(x) ? "n/a" : x.ToString("G" + significant.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A fixed-decimals value.</summary>
    public static string Fixed(double x, int decimals) =>
        double.IsNaN(x) ? "n/a" : x.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A range of counts: "5" when both ends agree, else "3 to 6".</summary>
    public static string Range(int low, int high) => low == high ? Count(low) : Count(low) + " to " + Count(high);

    /// <summary>An integer.</summary>
    public static string Count(int n) => n.ToString(CultureInfo.InvariantCulture);
}
