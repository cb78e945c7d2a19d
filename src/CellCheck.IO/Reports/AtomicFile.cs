using CellCheck.Core.Problems;

namespace CellCheck.IO.Reports;

/// <summary>
/// Writes an output file atomically: to a temporary file in the same folder, then renamed over the target, so an
/// interrupted run never leaves a half-written report. Refuses to write over any input file. Creates missing folders.
/// </summary>
public static class AtomicFile
{
    public static Problem? Write(string path, IEnumerable<string> inputs, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(inputs);
        ArgumentNullException.ThrowIfNull(write);
        var full = Path.GetFullPath(path);
        foreach (var input in inputs)
        {
            if (string.Equals(Path.GetFullPath(input), full, StringComparison.Ordinal))
            {
                return new Problem(ProblemCodes.OutputIsInput, path, null, null,
                    "This output path is one of the input files; CellCheck never overwrites its inputs.", "Choose another output file name.");
            }
        }

        var folder = Path.GetDirectoryName(full) ?? ".";
        var temp = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            Directory.CreateDirectory(folder);
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temp, full, overwrite: true);
            return null;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            return new Problem(ProblemCodes.OutputUnwritable, path, null, null, "The report cannot be written: " + ex.Message,
                "Check that the folder exists or can be created and that you may write there.");
        }
    }

    private static void TryDelete(string temp)
    {
        try
        {
            File.Delete(temp);
        }
        catch (IOException)
        {
            // Best effort: the temporary file is hidden and named as such.
        }
        catch (UnauthorizedAccessException)
        {
            // Same.
        }
    }
}
