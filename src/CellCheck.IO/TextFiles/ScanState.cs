namespace CellCheck.IO.TextFiles;

/// <summary>The position and UTF-8 decoding state of <see cref="TextScan"/>; <see cref="Step"/> takes one byte.</summary>
internal sealed class ScanState(long maxLineBytes)
{
    private int _line = 1;
    private int _column = 1;
    private long _lineBytes;
    private bool _afterCr;
    private int _pending;
    private byte _low = 0x80;
    private byte _high = 0xBF;
    private byte _lead;
    private int _leadLine;
    private int _leadColumn;

    /// <summary>Takes a run of bytes. ASCII without NUL (the usual data file) is taken at once when its lines end in LF
    /// (<see cref="UnixLines"/>: one vectorised check of the bytes and a count of the LFs), else line by line with
    /// vectorised searches; anything else, and any line that would run over the limit, byte by byte through
    /// <see cref="Step"/>, so faults are found and located exactly as there.</summary>
    public TextFault? Run(ReadOnlySpan<byte> bytes)
    {
        if (_pending == 0 && !_afterCr && bytes.IndexOfAnyExcept(LfText) < 0 && UnixLines(bytes))
        {
            return null;
        }

        if (_pending == 0 && System.Text.Ascii.IsValid(bytes) && !bytes.Contains((byte)0))
        {
            while (!bytes.IsEmpty)
            {
                var end = bytes.IndexOfAny((byte)'\r', (byte)'\n');
                var text = end < 0 ? bytes.Length : end;
                if (_lineBytes + text > maxLineBytes)
                {
                    break;
                }

                if (text > 0)
                {
                    _lineBytes += text;
                    _column += text;
                    _afterCr = false;
                }

                if (end < 0)
                {
                    return null;
                }

                _ = Step(bytes[end]);
                bytes = bytes[(end + 1)..];
            }
        }

        foreach (var b in bytes)
        {
            if (Step(b) is { } fault)
            {
                return fault;
            }
        }

        return null;
    }

    /// <summary>The bytes of ASCII text without NUL whose lines end in LF alone (the usual data file).</summary>
    private static readonly System.Buffers.SearchValues<byte> LfText =
        System.Buffers.SearchValues.Create([.. Enumerable.Range(1, 127).Where(b => b != '\r').Select(b => (byte)b)]);

    /// <summary>Takes bytes of <see cref="LfText"/> (after no CR) by counting their line ends at once, when no line runs
    /// over the limit; false, with nothing taken, when a line may (the line-by-line route then finds it).</summary>
    private bool UnixLines(ReadOnlySpan<byte> bytes)
    {
        var first = bytes.IndexOf((byte)'\n');
        var last = bytes.LastIndexOf((byte)'\n');

        // the bytes before the first LF continue the line before; a line between two LFs is shorter than the stretch
        // from the first LF to the last; the bytes after the last LF start the next line
        var mayRunOver = first < 0
            ? _lineBytes + bytes.Length > maxLineBytes
            : _lineBytes + first > maxLineBytes || last - first + 1 > maxLineBytes || bytes.Length - last - 1 > maxLineBytes;
        if (mayRunOver)
        {
            return false;
        }

        if (first < 0)
        {
            (_lineBytes, _column) = (_lineBytes + bytes.Length, _column + bytes.Length);
            return true;
        }

        _line += bytes.Count((byte)'\n');
        (_lineBytes, _column) = (bytes.Length - last - 1, bytes.Length - last);
        return true;
    }

    public TextFault? Step(byte b)
    {
        if (_pending > 0)
        {
            if (b < _low || b > _high)
            {
                return Invalid();
            }

            _pending--;
            (_low, _high) = ((byte)0x80, (byte)0xBF);
            return CountByte();
        }

        if (b == (byte)'\r' || (b == (byte)'\n' && !_afterCr))
        {
            NewLine(b == (byte)'\r');
            return null;
        }

        if (b == (byte)'\n')
        {
            _afterCr = false;
            return null;
        }

        _afterCr = false;
        if (b == 0)
        {
            return new TextFault(TextFaultKind.NotText, _line, _column, "a NUL byte (0x00)");
        }

        _lead = b;
        (_leadLine, _leadColumn) = (_line, _column);
        _column++;
        if (b >= 0x80 && !Lead(b))
        {
            return Invalid();
        }

        return CountByte();
    }

    /// <summary>A fault at the end of the stream: a multi-byte sequence cut short.</summary>
    public TextFault? End() => _pending > 0 ? Invalid() : null;

    private bool Lead(byte b)
    {
        (_pending, _low, _high) = b switch
        {
            >= 0xC2 and <= 0xDF => (1, (byte)0x80, (byte)0xBF),
            0xE0 => (2, (byte)0xA0, (byte)0xBF),
            0xED => (2, (byte)0x80, (byte)0x9F),
            >= 0xE1 and <= 0xEF => (2, (byte)0x80, (byte)0xBF),
            0xF0 => (3, (byte)0x90, (byte)0xBF),
            >= 0xF1 and <= 0xF3 => (3, (byte)0x80, (byte)0xBF),
            0xF4 => (3, (byte)0x80, (byte)0x8F),
            _ => (0, (byte)0x80, (byte)0xBF),
        };
        return _pending > 0;
    }

    private void NewLine(bool cr)
    {
        _line++;
        _column = 1;
        _lineBytes = 0;
        _afterCr = cr;
    }

    private TextFault? CountByte() => ++_lineBytes > maxLineBytes
        ? new TextFault(TextFaultKind.LineTooLong, _line, null, $"line {_line} is longer than {maxLineBytes / 1024} KiB")
        : null;

    private TextFault Invalid() => new(TextFaultKind.Encoding, _leadLine, _leadColumn,
        $"byte {TextScan.Hex(_lead)} at column {_leadColumn} does not start valid UTF-8 (Latin-1 and Windows-1252 write accented letters so)");
}
