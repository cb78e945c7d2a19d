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
    // an array, not the list: read per unit and factor, where an interface call per read cost a fifth of the
    // Box-Cox profile's serial step
    private readonly LevelCodes[] unitCodes = [.. codes];

    /// <summary>Treatment contrasts of the given codes: on each factor the lowest code present is the reference level
    /// (no column) and every other code present gets the next column; <paramref name="p"/> is the number of columns.</summary>
    public static BlockContrasts Treatment(IReadOnlyList<LevelCodes> codes, out int p)
    {
        var levels = new int[codes.Count][];
        p = 0;
        for (var j = 0; j < codes.Count; j++)
        {
            // level codes are small non-negative integers: the contrast column of each present code by a table
            var unit = codes[j];
            var largest = -1;
            for (var i = 0; i < unit.Length; i++)
            {
                largest = Math.Max(largest, unit[i]);
            }

            var present = new bool[largest + 1];
            for (var i = 0; i < unit.Length; i++)
            {
                present[unit[i]] = true;
            }

            var column = levels[j] = new int[largest + 1];
            var reference = true;
            for (var code = 0; code <= largest; code++)
            {
                column[code] = !present[code] || reference ? -1 : p++;
                reference &= !present[code];
            }
        }

        return new BlockContrasts(codes, levels);
    }

    /// <summary>Number of block factors.</summary>
    public int Factors => levels.Length;

    /// <summary>Per block factor, the contrast column of each level code.</summary>
    public int[][] Levels => levels;

    /// <summary>The contrast column of <paramref name="unit"/> on block factor <paramref name="factor"/>, or −1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // per unit and factor in the fit's loops
    public int Column(int factor, int unit) => levels[factor][unitCodes[factor][unit]];

    /// <summary>Writes the unit's contrast column on every block factor into <paramref name="target"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Fill(int unit, Span<int> target)
    {
        for (var j = 0; j < levels.Length; j++)
        {
            target[j] = Column(j, unit);
        }
    }
}
