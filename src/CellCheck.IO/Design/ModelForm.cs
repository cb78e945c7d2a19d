namespace CellCheck.IO.Design;

/// <summary>How the design file declares the model: every interaction among the factors, main effects only, or a list of terms.</summary>
public enum ModelForm
{
    Full,
    Main,
    Terms,
}
