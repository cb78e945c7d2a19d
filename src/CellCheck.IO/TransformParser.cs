using System.Globalization;
using CellCheck.Core.Problems;
using CellCheck.Core.Remedies;

namespace CellCheck.IO;

/// <summary>
/// Reads the <c>--transform</c> and <c>--shift</c> options: auto, none, log, sqrt, reciprocal, reciprocal-sqrt,
/// power:P (P from −5 to 5), yeo-johnson (at its estimated power) or yeo-johnson:P; and a finite shift, which needs a
/// transformation. A bad value is a located problem, never an exception.
/// </summary>
public static class TransformParser
{
    /// <summary>Largest |P| accepted in power:P and yeo-johnson:P (the range searched for λ̂).</summary>
    public const double PowerLimit = 5;

    private const string Allowed = "auto, log, sqrt, reciprocal, reciprocal-sqrt, power:P (P from -5 to 5, e.g. power:0.33), yeo-johnson or yeo-johnson:P";

    public static LoadResult<TransformRequest> Parse(string text, double? shift = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        var s = shift ?? 0;
        if (!double.IsFinite(s))
        {
            return LoadResult<TransformRequest>.Failure(new Problem(ProblemCodes.BadShift, "--shift", null, null,
                "the shift must be a finite number", "give the constant to add to every value, e.g. --shift 1"));
        }

        var t = text.Trim().ToLowerInvariant();
        TransformRequest? request = t switch
        {
            "auto" => TransformRequest.Auto(s),
            "none" => new TransformRequest(PowerFamily.BoxCox, 1, s),
            "log" => new TransformRequest(PowerFamily.BoxCox, 0, s),
            "sqrt" => new TransformRequest(PowerFamily.BoxCox, 0.5, s),
            "reciprocal" => new TransformRequest(PowerFamily.BoxCox, -1, s),
            "reciprocal-sqrt" => new TransformRequest(PowerFamily.BoxCox, -0.5, s),
            "yeo-johnson" => new TransformRequest(PowerFamily.YeoJohnson, null, s),
            _ when t.StartsWith("power:", StringComparison.Ordinal) => Power(PowerFamily.BoxCox, t["power:".Length..], s),
            _ when t.StartsWith("yeo-johnson:", StringComparison.Ordinal) => Power(PowerFamily.YeoJohnson, t["yeo-johnson:".Length..], s),
            _ => null,
        };
        return request is null
            ? LoadResult<TransformRequest>.Failure(new Problem(ProblemCodes.BadTransform, "--transform", null, null,
                "'" + text + "' is not a transformation CellCheck knows", "use one of " + Allowed))
            : LoadResult<TransformRequest>.Success(request);
    }

    /// <summary>The problem of a shift given without a transformation.</summary>
    public static Problem ShiftWithoutTransform() => new(ProblemCodes.BadShift, "--shift", null, null,
        "--shift adds a constant before a transformation, but no --transform was given", "add --transform (for example --transform auto) or leave out --shift");

    private static TransformRequest? Power(PowerFamily family, string number, double shift) =>
        double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out var p) && double.IsFinite(p) && Math.Abs(p) <= PowerLimit
            ? new TransformRequest(family, p, shift)
            : null;
}
