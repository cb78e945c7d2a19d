namespace CellCheck.Core.Calibration;

/// <summary>The test that decides the normality assumption.</summary>
public enum NormalityPrimary
{
    /// <summary>Too few residuals to judge.</summary>
    None,

    /// <summary>Shapiro-Wilk W on the pooled internally studentized residuals (3 to 5000 values).</summary>
    ShapiroWilkPooled,

    /// <summary>Anderson-Darling A² on the pooled internally studentized residuals (above 5000 values).</summary>
    AndersonDarlingPooled,
}
