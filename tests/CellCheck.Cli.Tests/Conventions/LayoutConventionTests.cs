using System.Reflection;
using System.Runtime.CompilerServices;

namespace CellCheck.Cli.Tests.Conventions;

/// <summary>The layout rules of the developers' guide: folder = namespace, one type per file named after it, sealed by default.</summary>
public sealed class LayoutConventionTests
{
    private static readonly Assembly[] Assemblies =
    [
        typeof(Core.Statistics.ShapiroWilk).Assembly,
        typeof(IO.CheckRun).Assembly,
        typeof(Program).Assembly,
    ];

    private static IEnumerable<Type> OwnTypes(Assembly assembly) => assembly.GetTypes().Where(t =>
        !t.IsNested && t.Namespace is not null && t.Namespace.StartsWith("CellCheck", StringComparison.Ordinal)
        && t.GetCustomAttribute<CompilerGeneratedAttribute>() is null && !t.Name.StartsWith('<'));

    [Fact]
    public void Every_type_lives_in_a_file_named_after_it_in_the_folder_of_its_namespace()
    {
        var missing = new List<string>();
        foreach (var assembly in Assemblies)
        {
            var project = assembly.GetName().Name == "cellcheck" ? "CellCheck.Cli" : assembly.GetName().Name!;
            foreach (var type in OwnTypes(assembly))
            {
                var relative = type.Namespace!.Length > project.Length ? type.Namespace[(project.Length + 1)..].Replace('.', Path.DirectorySeparatorChar) : string.Empty;
                var name = type.Name.Split('`')[0];
                var file = Path.Combine(CliRunner.RepoRoot, "src", project, relative, name + ".cs");
                if (!File.Exists(file))
                {
                    missing.Add(type.FullName + " -> " + file);
                }
            }
        }

        Assert.Empty(missing);
    }

    [Fact]
    public void Concrete_classes_are_sealed()
    {
        var open = Assemblies.SelectMany(OwnTypes)
            .Where(t => t.IsClass && !t.IsAbstract && !t.IsSealed && !typeof(Delegate).IsAssignableFrom(t))
            .Select(t => t.FullName)
            .ToList();
        Assert.Empty(open);
    }
}
