using System.Globalization;

namespace CellCheck.Core.Remedies;

/// <summary>
/// One transformation: a power in a family and the constant added to every value first. In the Box-Cox family the
/// transformed response is y^p (log y at p = 0): the same analysis as (y^p − 1)/p, in the units an analyst reads
/// (1/y for the reciprocal). In the Yeo-Johnson family it is the family's own formula (<see cref="YeoJohnson"/>).
/// </summary>
public sealed record TransformChoice(PowerFamily Family, double Power, double Shift = 0)
{
    /// <summary>True when the transformation leaves every check unchanged (power 1).</summary>
    public bool IsIdentity => Power == 1;

    /// <summary>The name used in reports and on the command line: none, reciprocal, reciprocal-sqrt, log, sqrt,
    /// power:P, or yeo-johnson:P.</summary>
    public string Name => Family == PowerFamily.YeoJohnson ? "yeo-johnson:" + Number(Power) : Power switch
    {
        1 => "none",
        -1 => "reciprocal",
        -0.5 => "reciprocal-sqrt",
        0 => "log",
        0.5 => "sqrt",
        _ => "power:" + Number(Power),
    };

    /// <summary>The transformation written as a formula of the response named <paramref name="y"/>.</summary>
    public string Formula(string y)
    {
        ArgumentNullException.ThrowIfNull(y);
        var x = Shift == 0 ? y : y + (Shift > 0 ? " + " : " - ") + Number(Math.Abs(Shift));
        var wrapped = Shift == 0 ? x : "(" + x + ")";
        return Family == PowerFamily.YeoJohnson ? "yeo-johnson(" + x + ", " + Number(Power) + ")" : Power switch
        {
            1 => x,
            -1 => "1/" + wrapped,
            -0.5 => "1/sqrt(" + x + ")",
            0 => "log(" + x + ")",
            0.5 => "sqrt(" + x + ")",
            _ => wrapped + "^" + Number(Power),
        };
    }

    /// <summary>The transformed value of one response value (before the shift is added).</summary>
    public double Apply(double value)
    {
        var y = value + Shift;
        if (Family == PowerFamily.YeoJohnson)
        {
            return YeoJohnson.Transform(y, Power);
        }

        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(y, nameof(value));
        return Power == 0 ? Math.Log(y) : Math.Pow(y, Power);
    }

    private static string Number(double x) => x.ToString("0.###", CultureInfo.InvariantCulture);
}
