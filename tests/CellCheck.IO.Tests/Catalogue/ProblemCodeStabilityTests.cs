using System.Reflection;

namespace CellCheck.IO.Tests.Catalogue;

/// <summary>Problem codes are stable across versions: a code once released is never removed or renamed (new codes
/// are added to this list when they are released; the list only grows).</summary>
public sealed class ProblemCodeStabilityTests
{
    private static readonly string[] Released =
    [
        "design.not-found",
        "design.unreadable",
        "design.too-large",
        "design.yaml-syntax",
        "design.not-a-mapping",
        "design.unknown-key",
        "design.duplicate-key",
        "design.missing-key",
        "design.wrong-type",
        "design.empty-list",
        "design.duplicate-name",
        "design.response-is-factor",
        "design.bad-alpha",
        "design.bad-adjust",
        "design.bad-kind",
        "design.missing-column",
        "design.bad-data-option",
        "design.bad-where",
        "design.bad-adjust-across",
        "design.bad-model",
        "design.unknown-term",
        "design.duplicate-term",
        "design.encoding",
        "design.not-text",
        "design.alias-limit",
        "design.too-deep",
        "design.multiple-documents",
        "data.not-found",
        "data.unreadable",
        "data.empty",
        "data.no-rows",
        "data.unsupported-format",
        "data.duplicate-column",
        "data.ragged-row",
        "data.bad-run-order",
        "data.non-numeric-level",
        "data.duplicate-run",
        "data.thousands-separator",
        "data.sheet-not-found",
        "data.empty-header",
        "data.no-rows-left",
        "data.encoding",
        "data.not-text",
        "data.line-too-long",
        "data.unclosed-quote",
        "output.is-input",
        "output.unwritable",
        "output.exists",
    ];

    [Fact]
    public void Every_released_problem_code_still_exists()
    {
        var current = typeof(ProblemCodes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Select(f => (string)f.GetRawConstantValue()!)
            .ToHashSet(StringComparer.Ordinal);
        Assert.All(Released, code => Assert.Contains(code, current));
    }
}
