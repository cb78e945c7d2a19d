using System.Diagnostics;
using System.Globalization;

namespace CellCheck.Fuzz;

/// <summary>
/// An in-process mutational fuzzer: seeded, bounded in time, fed by a corpus folder. Inputs whose outcome signature
/// (the problem codes returned) is new join the working corpus, a cheap stand-in for coverage feedback; every
/// exception is a crash and is kept by <see cref="CrashLog"/>.
/// </summary>
internal sealed class RandomFuzzer(FuzzTargets targets, string target, int seed)
{
    private const int MaxCorpus = 4000;

    public long Executions { get; private set; }

    public (long Executions, int Crashes, int Unique, int Corpus) Run(IReadOnlyList<byte[]> seeds, TimeSpan budget, CrashLog crashes)
    {
        var random = new Random(seed);
        var mutator = new Mutator(random);
        var corpus = seeds.Count > 0 ? seeds.ToList() : [[]];
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var s in corpus.ToList())
        {
            Try(s, seen, corpus, crashes, keep: false);
        }

        var clock = Stopwatch.StartNew();
        var report = TimeSpan.FromSeconds(15);
        while (clock.Elapsed < budget)
        {
            var parent = corpus[random.Next(corpus.Count)];
            var input = mutator.Mutate(parent, corpus[random.Next(corpus.Count)]);
            Try(input, seen, corpus, crashes, keep: true);
            if (clock.Elapsed > report)
            {
                report += TimeSpan.FromSeconds(15);
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"  {target}: {Executions} executions, {Executions / clock.Elapsed.TotalSeconds:F0}/s, {seen.Count} outcomes, corpus {corpus.Count}, crashes {crashes.Total}"));
            }
        }

        return (Executions, crashes.Total, crashes.Unique, corpus.Count);
    }

    private void Try(byte[] input, HashSet<string> seen, List<byte[]> corpus, CrashLog crashes, bool keep)
    {
        Executions++;
        try
        {
            var outcome = targets.Run(target, input);
            if (seen.Add(outcome) && keep && corpus.Count < MaxCorpus)
            {
                corpus.Add(input);
            }
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            crashes.Add(target, input, ex);
        }
    }
}
