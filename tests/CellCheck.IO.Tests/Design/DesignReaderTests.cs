using CellCheck.IO.Design;

namespace CellCheck.IO.Tests.Design;

public sealed class DesignReaderTests
{
    private static LoadResult<DesignFile> Parse(string yaml) => DesignReader.Parse(yaml.Replace("\r", string.Empty, StringComparison.Ordinal), "/tmp/d/design.yaml");

    [Fact]
    public void The_minimal_form_reads_with_defaults()
    {
        var r = Parse("data: trial.csv\nfactors: [cure_temp, line_speed, primer]\nresponses: [adhesion]\nrun_order: run\n");
        Assert.True(r.Ok);
        var d = r.Value!;
        Assert.Equal(["cure_temp", "line_speed", "primer"], d.Factors.Select(f => f.Column));
        Assert.Equal("adhesion", d.Responses.Single().Name);
        Assert.Equal("run", d.RunOrder!.Column);
        Assert.Equal(0.05, d.Alpha);
        Assert.Equal(Path.GetFullPath("/tmp/d/trial.csv"), d.DataPath);
    }

    [Fact]
    public void Mapping_entries_carry_display_name_unit_and_kind()
    {
        var r = Parse("data: t.csv\nfactors:\n  - column: T\n    name: cure_temp\n    unit: degC\n    kind: numeric\nresponses:\n  - column: y\n    unit: MPa\n");
        Assert.True(r.Ok);
        var f = r.Value!.Factors.Single();
        Assert.Equal(("T", "cure_temp", "degC", FactorKind.Numeric), (f.Column, f.Name, f.Unit, f.Kind));
        Assert.Equal("MPa", r.Value.Responses.Single().Unit);
    }

    [Fact]
    public void An_unknown_key_is_located_and_a_near_key_is_suggested()
    {
        var r = Parse("data: t.csv\nfactors: [a]\nresponses: [y]\nalpah: 0.05\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal((ProblemCodes.UnknownKey, 4, 1), (p.Code, p.Line, p.Column));
        Assert.Contains("alpha", p.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_key_inside_an_entry_is_located_at_that_key()
    {
        var r = Parse("data: t.csv\nfactors:\n  - column: a\n    knd: numeric\nresponses: [y]\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal((ProblemCodes.UnknownKey, 4, 5), (p.Code, p.Line, p.Column));
        Assert.Contains("kind", p.Fix, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_required_keys_are_each_reported()
    {
        var r = Parse("alpha: 0.05\n");
        Assert.Equal(3, r.Problems.Count(p => p.Code == ProblemCodes.MissingKey));
    }

    [Fact]
    public void A_duplicate_name_is_located_at_the_second_entry()
    {
        var r = Parse("data: t.csv\nfactors: [a, b, a]\nresponses: [y]\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal((ProblemCodes.DuplicateName, 2, 17), (p.Code, p.Line, p.Column));
    }

    [Fact]
    public void A_response_that_is_also_a_factor_is_a_problem()
    {
        var r = Parse("data: t.csv\nfactors: [a, y]\nresponses:\n  - y\n");
        Assert.Contains(r.Problems, p => p.Code == ProblemCodes.ResponseIsFactor && p.Line == 4 && p.Column == 5);
    }

    [Fact]
    public void A_duplicate_key_is_located()
    {
        var r = Parse("data: t.csv\nfactors: [a]\nresponses: [y]\ndata: u.csv\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal(ProblemCodes.DuplicateKey, p.Code);
        Assert.Equal(4, p.Line);
    }

    [Theory]
    [InlineData("alpha: 0")]
    [InlineData("alpha: 0.9")]
    [InlineData("alpha: five")]
    public void An_alpha_outside_zero_to_one_half_is_refused(string line)
    {
        var r = Parse("data: t.csv\nfactors: [a]\nresponses: [y]\n" + line + "\n");
        Assert.Equal(ProblemCodes.BadAlpha, Assert.Single(r.Problems).Code);
    }

    [Fact]
    public void A_bad_factor_kind_and_a_bad_adjustment_are_both_reported()
    {
        var r = Parse("data: t.csv\nfactors:\n  - column: a\n    kind: ordinal\nresponses: [y]\nadjust: bonferroni\n");
        Assert.Equal([ProblemCodes.BadAdjust, ProblemCodes.BadKind], r.Problems.Select(p => p.Code).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Broken_yaml_is_a_located_syntax_problem()
    {
        var r = Parse("data: t.csv\nfactors: [a, b\nresponses: [y]\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal(ProblemCodes.YamlSyntax, p.Code);
        Assert.NotNull(p.Line);
    }

    [Fact]
    public void A_list_where_a_value_is_expected_is_a_wrong_type()
    {
        var r = Parse("data: [a.csv, b.csv]\nfactors: [a]\nresponses: [y]\n");
        Assert.Equal(ProblemCodes.WrongType, Assert.Single(r.Problems).Code);
    }

    [Fact]
    public void A_design_that_is_not_a_mapping_is_refused()
    {
        Assert.Equal(ProblemCodes.NotAMapping, Assert.Single(Parse("- a\n- b\n").Problems).Code);
    }

    [Fact]
    public void A_missing_design_file_and_a_folder_are_problems_not_exceptions()
    {
        Assert.Equal(ProblemCodes.DesignNotFound, Assert.Single(DesignReader.Read("/nonexistent/design.yaml").Problems).Code);
        Assert.Equal(ProblemCodes.DesignUnreadable, Assert.Single(DesignReader.Read(Path.GetTempPath()).Problems).Code);
    }

    [Fact]
    public void Blocks_and_a_term_list_model_are_read()
    {
        var r = Parse("data: t.csv\nfactors: [n, v]\nblocks: [block]\nresponses: [y]\nmodel: [n, v, n*v]\n");
        Assert.True(r.Ok);
        Assert.Equal("block", Assert.Single(r.Value!.Blocks).Column);
        Assert.Equal(ModelForm.Terms, r.Value.Model.Form);
        Assert.Equal(["n", "v"], r.Value.Model.Terms[2].Factors);
    }

    [Theory]
    [InlineData("model: [n, w]", ProblemCodes.UnknownTerm)]
    [InlineData("model: [n, block]", ProblemCodes.UnknownTerm)]
    [InlineData("model: [n, n]", ProblemCodes.DuplicateTerm)]
    [InlineData("model: [n*n]", ProblemCodes.DuplicateTerm)]
    [InlineData("model: partial", ProblemCodes.BadModel)]
    public void A_bad_model_is_located(string line, string code)
    {
        var r = Parse("data: t.csv\nfactors: [n, v]\nblocks: [block]\nresponses: [y]\n" + line + "\n");
        var p = Assert.Single(r.Problems);
        Assert.Equal((code, 5), (p.Code, p.Line));
    }
}
