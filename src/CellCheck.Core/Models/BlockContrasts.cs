using System.Runtime.CompilerServices;
using CellCheck.Core.Data;

namespace CellCheck.Core.Models;

/// <summary>
/// The treatment-contrast block columns of a set of units, read through the units' level codes: on block factor j,
/// unit i falls in contrast column <c>Levels[j][codes[j][i]]</c> (−1 for the factor's reference level). The level
/// table is a few entries long, so no column as long as the data is stored beside the codes.
/// </summary>
/// <param name="codes">Per block factor, the level code of each unit (all non-negative).</param>
/// <param name="levels">Per block factor, the contrast column of each level code (−1 for the reference level and for
/// codes no unit has).</param>
internal sealed class BlockContrasts(IReadOnlyList<LevelCodes> codes, int[][] levels)
{
    /// <summary>Number of block factors.</summary>
    public int Factors => levels.Length;

    /// <summary>Per block factor, the contrast column of each level code.</summary>
    public int[][] Levels => levels;

    /// <summary>The contrast column of <paramref name="unit"/> on block factor <paramref name="factor"/>, or −1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // per unit and factor in the fit's loops
    public int Column(int factor, int unit) => levels[factor][codes[factor][unit]];

    /// <summary>Writes the unit's contrast column on every block factor into <paramref name="target"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Fill(int unit, Span<int> target)
    {
        for (var j = 0; j < levels.Length; j++)
        {
            target[j] = levels[j][codes[j][unit]];
        }
    }
}
