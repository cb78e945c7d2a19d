using CellCheck.Core.Data;

namespace CellCheck.IO.Data;

/// <summary>
/// Records the data-file line of every row read. While the lines come one after another it only counts them; at the
/// first gap (a blank, skipped or filtered line) it writes the run so far into its buffer and records every line
/// from then on. A file without gaps thus never touches the buffer's memory.
/// </summary>
internal sealed class LineRecorder(ColumnBuffer<int> buffer)
{
    private readonly ColumnBuffer<int> _buffer = buffer;
    private int _first;
    private int _run; // lines counted but not written: _first, _first + 1, …
    private bool _writing;

    public int Count => _writing ? _buffer.Count : _run;

    public void Add(int line)
    {
        if (!_writing)
        {
            if (_run == 0)
            {
                (_first, _run) = (line, 1);
                return;
            }

            if (line == _first + _run)
            {
                _run++;
                return;
            }

            Write();
        }

        _buffer.Add(line);
    }

    /// <summary>Takes over the lines of <paramref name="next"/>, which recorded the rows after this recorder's.</summary>
    public void Append(LineRecorder next)
    {
        if (!_writing && !next._writing && (_run == 0 || next._run == 0 || next._first == _first + _run))
        {
            (_first, _run) = _run == 0 ? (next._first, next._run) : (_first, _run + next._run);
            next._run = 0;
            return;
        }

        Write();
        next.Write();
        _buffer.Append(next._buffer);
    }

    public LineNumbers Build() => _writing ? LineNumbers.From(_buffer.Detach()) : LineNumbers.Consecutive(_first, _run);

    private void Write()
    {
        if (_writing)
        {
            return;
        }

        for (var i = 0; i < _run; i++)
        {
            _buffer.Add(_first + i);
        }

        (_writing, _run) = (true, 0);
    }
}
