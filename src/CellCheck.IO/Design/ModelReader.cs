using CellCheck.Core.Problems;
using YamlDotNet.RepresentationModel;

namespace CellCheck.IO.Design;

/// <summary>Reads and checks the <c>model</c> entry against the declared factors and blocks.</summary>
internal static class ModelReader
{
    public static ModelDeclaration Read(YamlNode node, IReadOnlyList<ColumnSpec> factors, IReadOnlyList<ColumnSpec> blocks, string path, List<Problem> problems)
    {
        var mark = DesignValidator.Mark(node);
        if (node is YamlScalarNode { Value: { } text })
        {
            switch (text)
            {
                case "full": return new ModelDeclaration(ModelForm.Full, [], mark);
                case "main": return new ModelDeclaration(ModelForm.Main, [], mark);
                default:
                    problems.Add(new Problem(ProblemCodes.BadModel, path, mark.Line, mark.Column, $"Unknown model '{text}'.",
                        "Write model: full (all interactions), model: main (main effects only), or a list of terms such as [a, b, a*b]."));
                    return ModelDeclaration.Default;
            }
        }

        if (node is not YamlSequenceNode sequence || sequence.Children.Count == 0)
        {
            problems.Add(new Problem(ProblemCodes.BadModel, path, mark.Line, mark.Column, "The model must be full, main or a list of terms.",
                "Write for example model: [nitrogen, variety, nitrogen*variety]."));
            return ModelDeclaration.Default;
        }

        var names = factors.Select(f => f.Name).ToHashSet(StringComparer.Ordinal);
        var blockNames = blocks.Select(b => b.Name).ToHashSet(StringComparer.Ordinal);
        var terms = new List<TermSpec>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var child in sequence.Children)
        {
            var at = DesignValidator.Mark(child);
            var parts = (child as YamlScalarNode)?.Value?.Split('*', StringSplitOptions.TrimEntries) ?? [];
            var bad = parts.Length == 0 ? "(empty)" : parts.FirstOrDefault(p => !names.Contains(p));
            if (bad is not null)
            {
                var isBlock = blockNames.Contains(bad);
                problems.Add(new Problem(ProblemCodes.UnknownTerm, path, at.Line, at.Column,
                    isBlock ? $"'{bad}' is a block; blocks enter the model additively and cannot appear in terms." : $"'{bad}' in this term is not a factor of the design.",
                    isBlock ? "Remove the block from the model terms; it is in the model already." : "Use the factor names listed under factors, joined by * for an interaction."));
                continue;
            }

            var key = string.Join("*", parts.Order(StringComparer.Ordinal));
            if (parts.Distinct(StringComparer.Ordinal).Count() != parts.Length || !seen.Add(key))
            {
                problems.Add(new Problem(ProblemCodes.DuplicateTerm, path, at.Line, at.Column, $"The term '{(child as YamlScalarNode)?.Value}' repeats a factor or an earlier term.",
                    "List each term once, each factor once within a term."));
                continue;
            }

            terms.Add(new TermSpec(parts, at));
        }

        return new ModelDeclaration(ModelForm.Terms, terms, mark);
    }
}
