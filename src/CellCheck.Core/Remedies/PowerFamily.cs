namespace CellCheck.Core.Remedies;

/// <summary>The family of power transformations a remedy works in.</summary>
public enum PowerFamily
{
    /// <summary>Box &amp; Cox (1964): (y^λ − 1)/λ, log y at λ = 0; positive values only.</summary>
    BoxCox,

    /// <summary>Yeo &amp; Johnson (2000): a power family for values of any sign.</summary>
    YeoJohnson,
}
