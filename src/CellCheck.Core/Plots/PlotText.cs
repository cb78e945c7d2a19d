using System.Globalization;
using CellCheck.Core.Analysis;

namespace CellCheck.Core.Plots;

/// <summary>Culture-free text for pictures: numbers with a true minus sign, p-values, counts.</summary>
public static class PlotText
{
    /// <summary>The minus sign (U+2212), which lines up with the plus sign and digits.</summary>
    public const string Minus = "\u2212";

    /// <summary>x with <paramref name="decimals"/> decimals, minus sign for negatives, never "−0".</summary>
    public static string Fixed(double x, int decimals)
    {
        var text = x.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        if (text.StartsWith('-'))
        {
            text = text.TrimStart('-');
            return text.All(c => c is '0' or '.') ? text : Minus + text;
        }

        return text;
    }

    /// <summary>x with up to <paramref name="significant"/> significant digits, with a minus sign.</summary>
    public static string Value(double x, int significant = 3)
    {
        var text = NumberText.Value(x, significant);
        return text.StartsWith('-') ? Minus + text[1..] : text;
    }

    /// <summary>A p-value as the reports print it.</summary>
    public static string P(double p) => NumberText.P(p);

    /// <summary>"name = p", or "name &lt; 0.0001" for the smallest p-values.</summary>
    public static string PIs(string name, double p)
    {
        var text = NumberText.P(p);
        return text.StartsWith('<') ? name + " " + text : name + " = " + text;
    }

    /// <summary>"name (unit)", or the name alone.</summary>
    public static string WithUnit(string name, string? unit) => string.IsNullOrEmpty(unit) ? name : name + " (" + unit + ")";

    /// <summary>A check's name as printed in pictures.</summary>
    public static string CheckName(string? check) => check switch
    {
        CheckNames.ShapiroWilk => "Shapiro-Wilk",
        CheckNames.AndersonDarling => "Anderson-Darling",
        CheckNames.DagostinoPearson => "D'Agostino-Pearson",
        CheckNames.Levene => "Levene",
        CheckNames.BrownForsythe => "Brown-Forsythe",
        CheckNames.BrownForsytheZerosRemoved => "Brown-Forsythe (zeros removed)",
        CheckNames.Bartlett => "Bartlett",
        CheckNames.FlignerKilleen => "Fligner-Killeen",
        CheckNames.DurbinWatson => "Durbin-Watson",
        CheckNames.Runs => "runs test",
        CheckNames.Trend => "trend",
        CheckNames.Outliers => "outlier screen",
        CheckNames.TukeyNonadditivity => "Tukey non-additivity",
        CheckNames.LackOfFit => "lack of fit",
        null => "no check",
        _ => check,
    };
}
