using CellCheck.Core.Data;

namespace CellCheck.IO.Data;

/// <summary>
/// Builds a factor column while reading: each distinct label is stored once (looked up by span, so repeated
/// labels allocate nothing) and every row gets a level index. At the end levels are put in natural order:
/// numerically when every label is a number, otherwise ordinal text order.
/// </summary>
/// <param name="codes">Where the codes go (a buffer in reserved space), or null for a buffer of its own.</param>
internal sealed class LevelInterner(string name, ColumnBuffer<int>? codes = null)
{
    private readonly LabelTable _table = new();
    private readonly ColumnBuffer<int> _codes = codes ?? new();

    public void Add(ReadOnlySpan<char> label)
    {
        if (label.IsEmpty)
        {
            _codes.Add(FactorColumn.Missing);
            return;
        }

        _codes.Add(_table.Intern(label));
    }

    /// <summary>Takes over the rows of <paramref name="next"/>, which read the rows after this interner's: its labels that
    /// are new here are added in its order of first appearance and its codes renumbered to match.</summary>
    public void Append(LevelInterner next)
    {
        var renumber = new int[next._table.Count];
        var same = true;
        for (var i = 0; i < renumber.Length; i++)
        {
            var code = _table.Intern(next._table.Labels[i]);
            renumber[i] = code;
            same &= code == i;
        }

        for (var s = 0; s < next._codes.SegmentCount && !same; s++)
        {
            var codes = next._codes.Segment(s);
            for (var row = 0; row < codes.Length; row++)
            {
                var c = codes[row];
                codes[row] = c < 0 ? c : renumber[c];
            }
        }

        _codes.Append(next._codes);
    }

    /// <summary>The first label that is not a number that can be computed with (finite, magnitude within the range
    /// <see cref="ResponseBuilder.InRange"/> allows), or null when every label is one.</summary>
    public string? FirstNonNumeric(NumberSyntax syntax) => _table.Labels.FirstOrDefault(l => !ResponseBuilder.InRange(syntax.ParseDouble(l)));

    public FactorColumn Build(bool asNumbers, NumberSyntax syntax)
    {
        var order = Enumerable.Range(0, _table.Count).ToArray();
        var numbers = new double[_table.Count];
        var numeric = true;
        for (var i = 0; i < numbers.Length && numeric; i++)
        {
            numbers[i] = syntax.ParseDouble(_table.Labels[i]);
            numeric = !double.IsNaN(numbers[i]);
        }

        if (numeric)
        {
            Array.Sort(order, (a, b) => numbers[a].CompareTo(numbers[b]));
        }
        else
        {
            Array.Sort(order, (a, b) => string.CompareOrdinal(_table.Labels[a], _table.Labels[b]));
        }

        var remap = new int[order.Length];
        var sorted = new string[order.Length];
        for (var rank = 0; rank < order.Length; rank++)
        {
            remap[order[rank]] = rank;
            sorted[rank] = _table.Labels[order[rank]];
        }

        // the codes renumbered in label order and narrowed in one pass; the reading buffer is then free
        var codes = LevelCodes.From(_codes.Detach(), sorted.Length, remap);
        return new FactorColumn(name, sorted, codes, asNumbers ? sorted.Select(l => syntax.ParseDouble(l)).ToArray() : null);
    }
}
