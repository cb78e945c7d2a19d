using CellCheck.Core.Problems;

namespace CellCheck.IO.TextFiles;

/// <summary>Turns a <see cref="TextFault"/> into a located problem of the data file or the design file.</summary>
public static class TextProblems
{
    public static Problem For(TextFault fault, string path, bool design)
    {
        ArgumentNullException.ThrowIfNull(fault);
        var what = design ? "design" : "data";
        return fault.Kind switch
        {
            TextFaultKind.Encoding => new Problem(design ? ProblemCodes.DesignEncoding : ProblemCodes.DataEncoding, path, fault.Line, fault.Column,
                $"The {what} file is not UTF-8 text: on line {fault.Line}, {fault.Detail}.",
                "Save the file as UTF-8 (a spreadsheet's 'CSV UTF-8' format, or the UTF-8 encoding in a text editor) and run again."),
            TextFaultKind.NotText => new Problem(design ? ProblemCodes.DesignNotText : ProblemCodes.DataNotText, path, fault.Line, fault.Column,
                $"The {what} file is not a text file: line {fault.Line} holds {fault.Detail} (a workbook, an archive or another binary file?).",
                design ? "Give the design's .yaml text file." : "Name a delimited text file (.csv, .tsv, .txt) saved as UTF-8, or a workbook with the .xlsx extension."),
            _ => new Problem(ProblemCodes.LineTooLong, path, fault.Line, null,
                $"The {what} file has a line that is too long: {fault.Detail}.",
                "Check that rows are separated by line breaks: each run is one line of the file."),
        };
    }
}
