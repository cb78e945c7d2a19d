namespace CellCheck.Core.Plots;

/// <summary>The line y = Intercept + Slope · x.</summary>
public sealed record LineCoefficients(double Intercept, double Slope)
{
    /// <summary>The line's value at x.</summary>
    public double At(double x) => Intercept + (Slope * x);
}
