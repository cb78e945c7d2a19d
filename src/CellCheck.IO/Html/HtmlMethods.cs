using System.Text;

namespace CellCheck.IO.Html;

/// <summary>The methods section: each published method, the approximation used, and references.</summary>
internal static class HtmlMethods
{
    private static readonly (string Method, string How)[] Methods =
    [
        ("Shapiro-Wilk", "W with Royston's (1992, 1995) approximation of the coefficients and p-value (algorithm AS R94); exact p for n = 3; valid to 5000 values."),
        ("Anderson-Darling", "A² against the normal with estimated mean and SD; p from Stephens' modified statistic (D'Agostino & Stephens 1986)."),
        ("D'Agostino-Pearson K²", "skewness z (D'Agostino 1970) and kurtosis z (Anscombe & Glynn 1983), chi-square with 2 df."),
        ("Levene / Brown-Forsythe", "one-way F on absolute deviations from cell means (Levene 1960) or medians (Brown & Forsythe 1974); zeros removed for odd cells (Hines & O'Hara Hines 2000)."),
        ("Bartlett", "K² with the small-sample correction, chi-square with k − 1 df (Bartlett 1937)."),
        ("Fligner-Killeen", "normal scores of ranked absolute deviations from cell medians (Conover, Johnson & Johnson 1981); ties equal in decimal kept as ties."),
        ("Primary p-values", "Monte Carlo p-values from a seeded simulation of the actual design under normal errors with equal spread; Holm (1979) across the assumptions judged."),
        ("Durbin-Watson", "d of the model residuals in run order; exact p by Imhof's (1961) integral over the eigenvalues of M·A; normal approximation with exact moments above 1000 rows."),
        ("Runs test", "Wald & Wolfowitz (1940) runs of residual signs about the median; exact distribution (Swed & Eisenhart 1943) up to 20 of each sign."),
        ("Model fit", "least squares by Householder QR with column pivoting (Businger & Golub 1965) and one step of refinement (Björck 1967); aliasing decided in term order."),
        ("Tukey non-additivity", "one degree of freedom for non-additivity (Tukey 1949), as the F test of adding the squared fitted values."),
        ("Outliers", "externally studentized residuals, Student t with ν − 1 df, Bonferroni bound over the rows screened."),
        ("Lenth", "pseudo standard error of effects of an unreplicated two-level factorial (Lenth 1989)."),
    ];

    private static readonly string[] References =
    [
        "Anderson, T. W. & Darling, D. A. (1954). A test of goodness of fit. Journal of the American Statistical Association 49, 765-769.",
        "Anscombe, F. J. & Glynn, W. J. (1983). Distribution of the kurtosis statistic b2 for normal samples. Biometrika 70, 227-234.",
        "Bartlett, M. S. (1937). Properties of sufficiency and statistical tests. Proceedings of the Royal Society A 160, 268-282.",
        "Box, G. E. P. & Cox, D. R. (1964). An analysis of transformations. Journal of the Royal Statistical Society B 26, 211-252.",
        "Brown, M. B. & Forsythe, A. B. (1974). Robust tests for the equality of variances. Journal of the American Statistical Association 69, 364-367.",
        "Conover, W. J., Johnson, M. E. & Johnson, M. M. (1981). A comparative study of tests for homogeneity of variances. Technometrics 23, 351-361.",
        "D'Agostino, R. B. (1970). Transformation to normality of the null distribution of g1. Biometrika 57, 679-681.",
        "D'Agostino, R. B. & Stephens, M. A. (1986). Goodness-of-Fit Techniques. Marcel Dekker.",
        "Durbin, J. & Watson, G. S. (1950, 1951). Testing for serial correlation in least squares regression I, II. Biometrika 37, 409-428; 38, 159-178.",
        "Hines, W. G. S. & O'Hara Hines, R. J. (2000). Increased power with modified forms of the Levene (Med) test. Biometrics 56, 451-454.",
        "Holm, S. (1979). A simple sequentially rejective multiple test procedure. Scandinavian Journal of Statistics 6, 65-70.",
        "Imhof, J. P. (1961). Computing the distribution of quadratic forms in normal variables. Biometrika 48, 419-426.",
        "Lenth, R. V. (1989). Quick and easy analysis of unreplicated factorials. Technometrics 31, 469-473.",
        "Levene, H. (1960). Robust tests for equality of variances. In Contributions to Probability and Statistics, Stanford University Press, 278-292.",
        "Royston, P. (1992). Approximating the Shapiro-Wilk W-test for non-normality. Statistics and Computing 2, 117-119.",
        "Royston, P. (1995). Remark AS R94: A remark on algorithm AS 181, the W-test for normality. Applied Statistics 44, 547-551.",
        "Shapiro, S. S. & Wilk, M. B. (1965). An analysis of variance test for normality (complete samples). Biometrika 52, 591-611.",
        "Tukey, J. W. (1949). One degree of freedom for non-additivity. Biometrics 5, 232-242.",
        "Wald, A. & Wolfowitz, J. (1940). On a test whether two samples are from the same population. Annals of Mathematical Statistics 11, 147-162.",
        "Yeo, I.-K. & Johnson, R. A. (2000). A new family of power transformations to improve normality or symmetry. Biometrika 87, 954-959.",
    ];

    public static void Write(StringBuilder sb)
    {
        sb.Append("<section><h2>Methods</h2><table><thead><tr><th>method</th><th>how it is computed</th></tr></thead><tbody>\n");
        foreach (var (method, how) in Methods)
        {
            sb.Append("<tr><td>").Append(Html.Text(method)).Append("</td><td>").Append(Html.Text(how)).Append("</td></tr>\n");
        }

        sb.Append("</tbody></table>\n<h3>References</h3><ol class=\"refs\">");
        foreach (var reference in References)
        {
            sb.Append("<li>").Append(Html.Text(reference)).Append("</li>");
        }

        sb.Append("</ol></section>\n");
    }
}
