using CellCheck.Core.Models;

namespace CellCheck.IO.Design;

/// <summary>Turns a design file's model declaration into the model specification Core fits.</summary>
public static class ModelSpecs
{
    public static ModelSpec From(DesignFile design)
    {
        ArgumentNullException.ThrowIfNull(design);
        var names = design.Factors.Select(f => f.Name).ToList();
        return design.Model.Form switch
        {
            ModelForm.Main => ModelSpec.Main(names.Count),
            ModelForm.Terms => new ModelSpec(design.Model.Terms.Select(t => new ModelTerm(t.Factors.Select(f => names.IndexOf(f)).ToArray())).ToArray()),
            _ => ModelSpec.Full(names.Count),
        };
    }
}
