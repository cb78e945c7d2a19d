namespace CellCheck.Core.Statistics;

/// <summary>
/// A one-way analysis of variance table (see <see cref="OneWayAnova"/>).
/// </summary>
/// <param name="SsBetween">Sum of squares between groups, Σ n_g (ȳ_g − ȳ)².</param>
/// <param name="SsWithin">Sum of squares within groups, Σ_g Σ_i (y_gi − ȳ_g)².</param>
/// <param name="DfBetween">Degrees of freedom between groups: non-empty groups − 1.</param>
/// <param name="DfWithin">Degrees of freedom within groups: values − non-empty groups.</param>
/// <param name="MsBetween">Mean square between groups (NaN when <paramref name="DfBetween"/> is 0).</param>
/// <param name="MsWithin">Mean square within groups (NaN when <paramref name="DfWithin"/> is 0).</param>
/// <param name="F">MsBetween / MsWithin; +∞ when only the within sum of squares is zero, NaN when undefined.</param>
/// <param name="P">Upper-tail probability of <paramref name="F"/> under F(DfBetween, DfWithin); NaN when undefined.</param>
/// <param name="RSquared">SsBetween / (SsBetween + SsWithin); NaN when the total is zero.</param>
/// <param name="ResidualSd">√MsWithin.</param>
public sealed record AnovaTable(
    double SsBetween,
    double SsWithin,
    int DfBetween,
    int DfWithin,
    double MsBetween,
    double MsWithin,
    double F,
    double P,
    double RSquared,
    double ResidualSd);
