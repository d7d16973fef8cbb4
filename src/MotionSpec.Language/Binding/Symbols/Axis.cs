namespace MotionSpec.Language.Binding.Symbols;

/// <summary>One of a frame's three unit directions.</summary>
public enum Axis
{
    /// <summary>The first unit vector.</summary>
    X = 0,

    /// <summary>The second unit vector.</summary>
    Y = 1,

    /// <summary>The third unit vector.</summary>
    Z = 2,
}
