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
        var target = Resolve(full);
        foreach (var input in inputs)
        {
            if (string.Equals(Resolve(Path.GetFullPath(input)), target, SameFile))
            {
                return new Problem(ProblemCodes.OutputIsInput, path, null, null,
                    "This output path is one of the input files; CellCheck never overwrites its inputs.", "Choose another output file name.");
            }
        }

        if (Directory.Exists(full))
        {
            return new Problem(ProblemCodes.OutputUnwritable, path, null, null, "This output path is a folder, not a file.",
                "Name a file, or use --out for a folder of reports.");
        }

        var folder = Path.GetDirectoryName(full) ?? ".";
        var temp = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        var done = false;
        try
        {
            Directory.CreateDirectory(folder);
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temp, full, overwrite: true);
            done = true;
            return null;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            return new Problem(ProblemCodes.OutputUnwritable, path, null, null, "The report cannot be written: " + ex.Message,
                "Check that the folder exists or can be created and that you may write there.");
        }
        finally
        {
            if (!done)
            {
                // Whatever stopped the writing (a full disk, or an exception from the writer), the temporary file
                // goes and the target keeps its previous content.
                TryDelete(temp);
            }
        }
    }

    /// <summary>File names compare without case where the file system usually ignores it (Windows, macOS).</summary>
    private static StringComparison SameFile => OperatingSystem.IsWindows() || OperatingSystem.IsMacOS()
        ? StringComparison.OrdinalIgnoreCase : StringComparison.Ordinal;

    /// <summary>The path with every symbolic link along it resolved (a link to the data file, or into its folder,
    /// counts as the data file); parts that do not exist yet are kept as written.</summary>
    private static string Resolve(string full)
    {
        try
        {
            var root = Path.GetPathRoot(full) ?? string.Empty;
            var resolved = root;
            foreach (var part in full[root.Length..].Split(Path.DirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries))
            {
                resolved = Path.Combine(resolved, part);
                var info = new FileInfo(resolved);
                if (info.LinkTarget is not null)
                {
                    resolved = info.ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? resolved;
                }
            }

            return resolved;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // A broken or cyclic link: compare the path as written.
            return full;
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
