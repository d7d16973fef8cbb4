using System.Collections.ObjectModel;

namespace MotionSpec.Symbolic;

/// <summary>A canonical sum of two or more terms (flattened, sorted, like terms combined).</summary>
public sealed class Sum : Expr
{
    private ReadOnlyCollection<Expr>? _terms;

    private Sum(Expr[] terms)
        : base(ExprKind.Sum, 7001, terms)
    {
    }

    /// <summary>The terms in canonical order (a constant term, if any, first).</summary>
    public IReadOnlyList<Expr> Terms => _terms ??= new ReadOnlyCollection<Expr>(Children);

    /// <summary>Content and primitive part, computed once (SumContent).</summary>
    internal SumContent.Split? CachedContent { get; set; }

    internal static Sum CreateRaw(Expr[] sortedTerms) => InternTable.Intern(new Sum(sortedTerms));

    internal override bool ShallowEquals(Expr other) => other is Sum && SameChildren(other);
}
