using CellCheck.Core.Problems;
using CellCheck.Core.Statistics;
using CellCheck.IO.TextFiles;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace CellCheck.IO.Design;

/// <summary>
/// Reads a design file (YAML, safe subset: plain mappings, sequences and scalars; tags carry no meaning and construct
/// nothing) and validates it. The file must be UTF-8 text of at most <see cref="MaxBytes"/>; nesting depth, aliases
/// and their expansion are capped (<see cref="GuardedParser"/>). Every problem is returned located (line and column), never thrown.
/// </summary>
public static class DesignReader
{
    /// <summary>Design files above this size are refused (a design is a few lines).</summary>
    public const long MaxBytes = 1 << 20;

    private static readonly string[] Keys =
    [
        "name", "data", "factors", "responses", "blocks", "model", "run_order", "alpha", "adjust", "adjust_across",
        "sheet", "header_row", "delimiter", "decimal", "thousands", "missing", "where",
    ];

    public static LoadResult<DesignFile> Read(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (Directory.Exists(path))
        {
            return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.DesignUnreadable, path, null, null,
                "This is a folder, not a design file.", "Give the path of the design's .yaml file."));
        }

        if (!File.Exists(path))
        {
            return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.DesignNotFound, path, null, null,
                "The design file does not exist.", "Check the path; it is taken relative to the current folder."));
        }

        string text;
        try
        {
            if (new FileInfo(path).Length > MaxBytes)
            {
                return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.DesignTooLarge, path, null, null,
                    $"The design file is larger than {MaxBytes / 1024} KiB.", "A design file names columns and settings; keep the data in the data file."));
            }

            var bytes = File.ReadAllBytes(path);
            using var scanned = new MemoryStream(bytes, writable: false);
            if (TextScan.Scan(scanned, maxLineBytes: null) is { } fault)
            {
                return LoadResult<DesignFile>.Failure(TextProblems.For(fault, path, design: true));
            }

            var bom = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
            text = System.Text.Encoding.UTF8.GetString(bytes, bom, bytes.Length - bom);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.DesignUnreadable, path, null, null,
                "The design file cannot be read: " + ex.Message, "Check the file's permissions."));
        }

        return Parse(text, path);
    }

    /// <summary>Parses design text; <paramref name="path"/> names the file in problems and anchors the data path.</summary>
    public static LoadResult<DesignFile> Parse(string text, string path)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        YamlMappingNode root;
        var guard = new GuardedParser(new Parser(new StringReader(text)));
        try
        {
            var stream = new YamlStream();
            stream.Load(guard);
            if (stream.Documents.Count == 0 || stream.Documents[0].RootNode is not YamlMappingNode mapping)
            {
                return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.NotAMapping, path, 1, 1,
                    "The design file is not a set of 'key: value' lines.", "Start from the example in the README: data, factors and responses keys."));
            }

            root = mapping;
        }
        catch (YamlException ex) when (guard.Code is not null)
        {
            return LoadResult<DesignFile>.Failure(new Problem(guard.Code, path, (int)ex.Start.Line, (int)ex.Start.Column, ex.Message, LimitFix(guard.Code)));
        }
        catch (YamlException ex) when (TabIndent(text) is { } tab && ex.Message.Contains("tab", StringComparison.OrdinalIgnoreCase))
        {
            return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.YamlSyntax, path, tab.Line, tab.Column,
                $"Line {tab.Line} is indented with a tab; YAML indents with spaces only.", "Replace the tab at the start of the line with spaces."));
        }
        catch (YamlException ex)
        {
            var duplicate = ex.Message.Contains("duplicate key", StringComparison.OrdinalIgnoreCase);
            return LoadResult<DesignFile>.Failure(new Problem(duplicate ? ProblemCodes.DuplicateKey : ProblemCodes.YamlSyntax, path,
                (int)ex.Start.Line, (int)ex.Start.Column,
                duplicate ? "A key is written twice." : "The YAML cannot be read: " + FirstLine(ex.Message),
                duplicate ? "Keep one of the two entries." : "Check indentation (spaces, not tabs), colons and brackets near this place."));
        }
        catch (Exception ex) when (ex is InvalidOperationException or ArgumentException)
        {
            // The YAML scanner and tree loader can fail without a YamlException on some broken flow collections and
            // on keys of an unexpected kind; locate the failure at the end of the last event parsed.
            var mark = LastParsedMark(text);
            return LoadResult<DesignFile>.Failure(new Problem(ProblemCodes.YamlSyntax, path, mark.Line, mark.Column,
                "The YAML cannot be read after this place.", "Check for an unclosed bracket or quote, and indentation (spaces, not tabs)."));
        }

        return new DesignValidator(path, root, Keys).Validate();
    }

    private static string LimitFix(string code) => code switch
    {
        ProblemCodes.TooDeep => "A design file needs two or three levels: write lists and mappings flat.",
        ProblemCodes.MultipleDocuments => "Keep one design per file: remove the second '---' and what follows, or move it to its own file.",
        ProblemCodes.AliasLimit => "Write the values out instead of repeating them with anchors (&name) and aliases (*name).",
        _ => "Write the anchor (&name) before any alias (*name) that refers to it.",
    };

    /// <summary>The first tab in the indentation of a line (1-based line and column), or null.</summary>
    private static SourceMark? TabIndent(string text)
    {
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var indent = lines[i].Length - lines[i].TrimStart(' ', '\t').Length;
            var tab = lines[i].AsSpan(0, indent).IndexOf('\t');
            if (tab >= 0)
            {
                return new SourceMark(i + 1, tab + 1);
            }
        }

        return null;
    }

    private static SourceMark LastParsedMark(string text)
    {
        var parser = new Parser(new StringReader(text));
        var mark = new SourceMark(1, 1);
        try
        {
            while (parser.MoveNext())
            {
                mark = new SourceMark((int)parser.Current!.End.Line, (int)parser.Current.End.Column);
            }
        }
        catch (Exception ex) when (ex is YamlException or InvalidOperationException or ArgumentException)
        {
            // The mark of the last event parsed is the best location there is (the parser throws
            // ArgumentException for a tag that is not a valid URI, for example).
        }

        return mark;
    }

    private static string FirstLine(string message)
    {
        var cut = message.IndexOf('\n', StringComparison.Ordinal);
        return cut < 0 ? message : message[..cut];
    }

    public static AdjustMethod? ParseAdjust(string text) => text switch
    {
        "holm" => AdjustMethod.Holm,
        "bh" or "benjamini-hochberg" => AdjustMethod.BenjaminiHochberg,
        "none" => AdjustMethod.None,
        _ => null,
    };
}
