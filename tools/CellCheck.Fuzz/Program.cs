using System.Globalization;
using CellCheck.Fuzz;

// Fuzz harness for CellCheck's readers. Usage (see tools/fuzz.sh):
//   CellCheck.Fuzz TARGET [--seconds N] [--seed S] [--corpus DIR] [--crashes DIR]   in-process mutational fuzzing
//   CellCheck.Fuzz TARGET --afl                                                     one SharpFuzz/AFL++ target process
//   CellCheck.Fuzz TARGET --libfuzzer                                               one SharpFuzz/libFuzzer target process
//   CellCheck.Fuzz TARGET --replay PATH                                             run files once; exit 1 on any crash
// TARGET is one of csv, design, check, init, xlsx.
if (args.Length == 0 || !FuzzTargets.Names.Contains(args[0]))
{
    Console.Error.WriteLine("usage: CellCheck.Fuzz " + string.Join('|', FuzzTargets.Names) + " [--seconds N] [--seed S] [--corpus DIR] [--crashes DIR] | --afl | --libfuzzer | --replay PATH");
    return 2;
}

var target = args[0];
string? Option(string name) => Array.IndexOf(args, name) is var i and >= 0 && i + 1 < args.Length ? args[i + 1] : null;
using var targets = new FuzzTargets();

if (args.Contains("--afl"))
{
    SharpFuzz.Fuzzer.Run(stream =>
    {
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        targets.Run(target, buffer.ToArray());
    });
    return 0;
}

if (args.Contains("--libfuzzer"))
{
    SharpFuzz.Fuzzer.LibFuzzer.Run(span => targets.Run(target, span.ToArray()));
    return 0;
}

if (Option("--replay") is { } replay)
{
    var files = Directory.Exists(replay) ? Directory.GetFiles(replay).Where(f => !f.EndsWith(".txt", StringComparison.Ordinal)).Order(StringComparer.Ordinal).ToArray() : [replay];
    var failed = 0;
    foreach (var file in files)
    {
        try
        {
            Console.WriteLine(Path.GetFileName(file) + ": " + targets.Run(target, File.ReadAllBytes(file)));
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            failed++;
            Console.WriteLine(Path.GetFileName(file) + ": CRASH " + ex);
        }
    }

    return failed == 0 ? 0 : 1;
}

var seconds = double.Parse(Option("--seconds") ?? "60", CultureInfo.InvariantCulture);
var seed = int.Parse(Option("--seed") ?? "1", CultureInfo.InvariantCulture);
var corpusDir = Option("--corpus") ?? Path.Combine("tools", "CellCheck.Fuzz", "corpus", target);
var seeds = Directory.Exists(corpusDir) ? Directory.GetFiles(corpusDir).Order(StringComparer.Ordinal).Select(File.ReadAllBytes).ToList() : [];
var crashes = new CrashLog(Option("--crashes") ?? Path.Combine("artifacts", "fuzz", "crashes"));
Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"fuzzing {target} for {seconds} s, seed {seed}, {seeds.Count} corpus files from {corpusDir}"));
var result = new RandomFuzzer(targets, target, seed).Run(seeds, TimeSpan.FromSeconds(seconds), crashes);
Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
    $"target {target}: {result.Executions} executions, {result.Crashes} crashing inputs, {result.Unique} distinct crashes, working corpus {result.Corpus}"));
return result.Crashes == 0 ? 0 : 1;
