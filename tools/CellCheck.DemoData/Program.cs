namespace CellCheck.DemoData;

/// <summary>Writes the demo data sets into the designs folder given as the only argument (default: designs).</summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        var folder = args.Length > 0 ? args[0] : "designs";
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, "coating-cure.csv"), CoatingCure.Csv());
        File.WriteAllText(Path.Combine(folder, "assay-lab.csv"), AssayLab.Csv());
        File.WriteAllText(Path.Combine(folder, "field-trial.csv"), FieldTrial.Csv());
        File.WriteAllText(Path.Combine(folder, "oven-drift.csv"), OvenDrift.Csv());
        File.WriteAllText(Path.Combine(folder, "fluorescence-assay.csv"), FluorescenceAssay.Csv());
        Console.WriteLine("Wrote coating-cure.csv, assay-lab.csv, field-trial.csv, oven-drift.csv and fluorescence-assay.csv to " + folder);
        return 0;
    }
}
