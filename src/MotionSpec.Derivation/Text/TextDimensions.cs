using System.Globalization;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;
using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Derivation.Text;

/// <summary>
/// Keeps the printed closed forms dimensionally consistent under the language's own rules, so that a line
/// pasted back into a spec checks clean. The kinematics stage folds constants with units into SI numbers; when
/// such a number multiplies out to a coefficient of one, the printed term loses the unit it carried (from
/// <c>0.5 m</c> times <c>2</c>, say) and a sum then mixes m/s^2 with 1/s^2. Such a term is multiplied by a
/// named unit of value one in SI (<c>let unit_m = 1 m</c>), which changes no number and restores its dimension.
/// </summary>
internal sealed class TextDimensions
{
    private readonly Dictionary<string, Dimension> _params = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Dimension> _coords = new(StringComparer.Ordinal);
    private readonly Dictionary<Symbol, Dimension> _intermediates = [];
    private readonly Dictionary<Dimension, Symbol> _units = [];
    private readonly List<(Symbol Name, string Definition)> _unitLets = [];
    private readonly Func<string, bool> _isTaken;

    public TextDimensions(BoundSpec spec, Func<string, bool> isTaken)
    {
        _isTaken = isTaken;
        foreach (var p in spec.Parameters)
        {
            _params[p.Name] = p.Dimension;
        }

        foreach (var c in spec.Coords)
        {
            _coords[c.Name] = c.Dimension;
        }
    }

    /// <summary>The unit lets the repairs used, in order of first use.</summary>
    public IReadOnlyList<(Symbol Name, string Definition)> UnitLets => _unitLets;

    /// <summary>Records the dimension of a named intermediate once its (repaired) value is known.</summary>
    public void Define(Symbol intermediate, Expr value) => _intermediates[intermediate] = Of(value);

    /// <summary>The dimension the language gives <paramref name="e"/> as the text printer writes it.</summary>
    public Dimension Of(Expr e)
    {
        switch (e)
        {
            case Number or PiConstant:
                return Dimension.Free;
            case Symbol s:
                return s.Kind switch
                {
                    SymbolKind.Time => Dimension.TimeDimension,
                    SymbolKind.Param => _params.GetValueOrDefault(s.Name, Dimension.Free),
                    SymbolKind.Coord => _coords.TryGetValue(s.Name, out var d) ? Dimension.Of(d.Length, d.Time - s.Order) : Dimension.Free,
                    _ => _intermediates.GetValueOrDefault(s, Dimension.Free),
                };
            case Sum sum:
                return sum.Terms.Select(Of).FirstOrDefault(d => !d.IsFree, Dimension.Free);
            case Product product:
                {
                    var coefficient = product.Factors[0].TryGetRational(out var c) ? c : Rational.One;
                    if (coefficient != Rational.One && coefficient != -Rational.One)
                    {
                        return Dimension.Free; // the printed number makes the product free
                    }

                    if (product.Factors.All(f => f is Number || (f is Power p && p.Exponent.Sign < 0)))
                    {
                        return Dimension.Free; // printed as 1/(...)
                    }

                    var length = 0;
                    var time = 0;
                    foreach (var factor in product.Factors.Where(f => f is not Number))
                    {
                        var d = Of(factor);
                        if (d.IsFree)
                        {
                            return Dimension.Free;
                        }

                        length += d.Length;
                        time += d.Time;
                    }

                    return Dimension.Of(length, time);
                }

            case Power power:
                {
                    if (power.Exponent.Sign < 0)
                    {
                        return Dimension.Free; // printed as 1/(...)
                    }

                    var d = Of(power.Base);
                    if (d.IsFree)
                    {
                        return d;
                    }

                    var length = power.Exponent * d.Length;
                    var time = power.Exponent * d.Time;
                    return length.IsInteger && time.IsInteger
                        ? Dimension.Of((int)length.Numerator, (int)time.Numerator)
                        : Dimension.Free;
                }

            default:
                return Dimension.Dimensionless; // every function returns an angle or a ratio
        }
    }

    /// <summary>
    /// <paramref name="e"/> with a unit factor on every sum term whose dimension disagrees with the sum's:
    /// <paramref name="expected"/> where the caller knows it, else the most common fixed dimension of the terms.
    /// </summary>
    public Expr Repair(Expr e, Dimension? expected)
    {
        switch (e)
        {
            case Sum sum:
                {
                    var terms = sum.Terms.Select(t => Repair(t, expected is { IsFree: false } ? expected : null)).ToList();
                    var target = expected is { IsFree: false } known ? known : MostCommon(terms.Select(Of));
                    if (target is not { } dimension)
                    {
                        return Expr.Sum(terms);
                    }

                    for (var i = 0; i < terms.Count; i++)
                    {
                        var d = Of(terms[i]);
                        if (!d.IsFree && d != dimension)
                        {
                            terms[i] = terms[i] * Unit(Dimension.Of(dimension.Length - d.Length, dimension.Time - d.Time));
                        }
                    }

                    return Expr.Sum(terms);
                }

            case Product product:
                {
                    var factors = product.Factors.ToList();
                    var dims = factors.Select(f => f is Number ? Dimension.Free : Of(f)).ToList();
                    var othersFixed = expected is { IsFree: false } && Of(product) is { IsFree: false };
                    for (var i = 0; i < factors.Count; i++)
                    {
                        Dimension? wanted = null;
                        if (othersFixed && factors[i] is Sum)
                        {
                            var length = expected!.Value.Length - dims.Where((_, j) => j != i && factors[j] is not Number).Sum(d => d.Length);
                            var time = expected.Value.Time - dims.Where((_, j) => j != i && factors[j] is not Number).Sum(d => d.Time);
                            wanted = Dimension.Of(length, time);
                        }

                        factors[i] = Repair(factors[i], wanted);
                    }

                    return Expr.Product(factors);
                }

            case Power power:
                return Expr.Pow(Repair(power.Base, null), power.Exponent);
            case Call call:
                {
                    // The language wants the argument of a trigonometric, exponential or logarithmic function to be an angle.
                    Dimension? argument = call.Function is Function.Sqrt or Function.Atan2 ? null : Dimension.Dimensionless;
                    return Expr.Call(call.Function, call.Arguments.Select(a => Repair(a, argument)).ToArray());
                }

            default:
                return e;
        }
    }

    private static Dimension? MostCommon(IEnumerable<Dimension> dims)
    {
        var fixedDims = dims.Where(d => !d.IsFree).ToList();
        if (fixedDims.Count == 0)
        {
            return null;
        }

        // Ties go to the first seen, so the choice does not depend on hashing.
        return fixedDims.GroupBy(d => d).OrderByDescending(g => g.Count()).ThenBy(g => fixedDims.IndexOf(g.Key)).First().Key;
    }

    private Symbol Unit(Dimension dimension)
    {
        if (_units.TryGetValue(dimension, out var existing))
        {
            return existing;
        }

        var parts = new List<string>();
        var above = new List<string>();
        var below = new List<string>();
        Part("m", dimension.Length);
        Part("s", dimension.Time);
        var name = "unit_" + string.Join("_", above) + (below.Count == 0 ? string.Empty : (above.Count == 0 ? "per_" : "_per_") + string.Join("_", below));
        while (_isTaken(name) || _unitLets.Exists(u => u.Name.Name == name))
        {
            name += "_";
        }

        var symbol = Symbol.Intermediate(name);
        _units[dimension] = symbol;
        _intermediates[symbol] = dimension;
        _unitLets.Add((symbol, "1 " + string.Join("*", parts)));
        return symbol;

        void Part(string atom, int exponent)
        {
            if (exponent == 0)
            {
                return;
            }

            parts.Add(exponent == 1 ? atom : atom + "^" + exponent.ToString(CultureInfo.InvariantCulture));
            var magnitude = Math.Abs(exponent);
            (exponent > 0 ? above : below).Add(magnitude == 1 ? atom : atom + magnitude.ToString(CultureInfo.InvariantCulture));
        }
    }
}
