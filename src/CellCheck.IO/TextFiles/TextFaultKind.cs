namespace CellCheck.IO.TextFiles;

/// <summary>What is wrong with the bytes of a file that should be UTF-8 text.</summary>
public enum TextFaultKind
{
    /// <summary>Bytes that are not UTF-8 (Latin-1 or Windows-1252 accents), or a UTF-16 text file.</summary>
    Encoding,

    /// <summary>A NUL byte: the file is binary (a workbook, an archive), not text.</summary>
    NotText,

    /// <summary>A line longer than the limit (a file without line breaks, or a runaway field).</summary>
    LineTooLong,
}
