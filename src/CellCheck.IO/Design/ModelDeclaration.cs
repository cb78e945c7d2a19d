namespace CellCheck.IO.Design;

/// <summary>
/// The model a design file declares. <c>model: full</c> (the default) is every main effect and interaction among the
/// factors; <c>model: main</c> main effects only; <c>model: [a, b, a*b]</c> the listed terms, where <c>*</c> joins the
/// factors of an interaction. Blocks always enter additively and never in terms.
/// </summary>
public sealed record ModelDeclaration(ModelForm Form, IReadOnlyList<TermSpec> Terms, SourceMark Mark)
{
    public static ModelDeclaration Default { get; } = new(ModelForm.Full, [], new SourceMark(1, 1));
}
