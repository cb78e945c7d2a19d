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

    public static void Write(StringBuilder sb)
    {
        sb.Append("<section><h2>Methods</h2><table><thead><tr><th>method</th><th>how it is computed</th></tr></thead><tbody>\n");
        foreach (var (method, how) in Methods)
        {
            sb.Append("<tr><td>").Append(Html.Text(method)).Append("</td><td>").Append(Html.Text(how)).Append("</td></tr>\n");
        }

        sb.Append("</tbody></table></section>\n");
    }
}
