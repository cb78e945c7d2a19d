namespace CellCheck.Core.Remedies;

/// <summary>
/// Minimum of a function of one variable on a closed interval without derivatives: Brent's method (Brent 1973,
/// Algorithms for Minimization without Derivatives, Prentice-Hall, ch. 5), golden-section steps safeguarding
/// successive parabolic interpolation. Converges to a local minimum; the caller brackets the one it wants.
/// </summary>
internal static class BoundedBrent
{
    /// <summary>(3 − √5)/2, the golden-section fraction.</summary>
    private const double Golden = 0.3819660112501051;

    /// <summary>√ε for double: no smaller relative step can change a smooth function's value near its minimum.</summary>
    private const double SqrtEpsilon = 1.4901161193847656e-8;

    /// <summary>The abscissa of a local minimum of <paramref name="f"/> in (a, b), to within about
    /// √ε·|x| + <paramref name="tolerance"/>.</summary>
    public static double Minimize(Func<double, double> f, double a, double b, double tolerance)
    {
        ArgumentNullException.ThrowIfNull(f);
        if (!(a < b))
        {
            throw new ArgumentException("the interval must have a < b", nameof(a));
        }

        double x = a + (Golden * (b - a)), w = x, v = x;
        double fx = f(x), fw = fx, fv = fx;
        double d = 0, e = 0;
        for (var iteration = 0; iteration < 500; iteration++)
        {
            var m = 0.5 * (a + b);
            var tol1 = (SqrtEpsilon * Math.Abs(x)) + (tolerance / 3);
            var tol2 = 2 * tol1;
            if (Math.Abs(x - m) <= tol2 - (0.5 * (b - a)))
            {
                break;
            }

            var parabolic = false;
            if (Math.Abs(e) > tol1)
            {
                var r = (x - w) * (fx - fv);
                var q = (x - v) * (fx - fw);
                var p = ((x - v) * q) - ((x - w) * r);
                q = 2 * (q - r);
                if (q > 0)
                {
                    p = -p;
                }
                else
                {
                    q = -q;
                }

                var previous = e;
                if (Math.Abs(p) < Math.Abs(0.5 * q * previous) && p > q * (a - x) && p < q * (b - x))
                {
                    e = d;
                    d = p / q;
                    var trial = x + d;
                    if (trial - a < tol2 || b - trial < tol2)
                    {
                        d = x < m ? tol1 : -tol1;
                    }

                    parabolic = true;
                }
            }

            if (!parabolic)
            {
                e = (x < m ? b : a) - x;
                d = Golden * e;
            }

            var u = x + (Math.Abs(d) >= tol1 ? d : (d > 0 ? tol1 : -tol1));
            var fu = f(u);
            if (fu <= fx)
            {
                if (u < x)
                {
                    b = x;
                }
                else
                {
                    a = x;
                }

                (v, fv, w, fw, x, fx) = (w, fw, x, fx, u, fu);
            }
            else
            {
                if (u < x)
                {
                    a = u;
                }
                else
                {
                    b = u;
                }

                if (fu <= fw || w == x)
                {
                    (v, fv, w, fw) = (w, fw, u, fu);
                }
                else if (fu <= fv || v == x || v == w)
                {
                    (v, fv) = (u, fu);
                }
            }
        }

        return x;
    }
}
