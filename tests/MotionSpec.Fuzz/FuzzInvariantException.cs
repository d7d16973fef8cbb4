namespace MotionSpec.Fuzz;

/// <summary>A rule the stages promise (a span inside the text, a model exactly when there are no errors) was broken.</summary>
public sealed class FuzzInvariantException : Exception
{
    /// <summary>Creates the exception.</summary>
    public FuzzInvariantException()
    {
    }

    /// <summary>Creates the exception with what was broken.</summary>
    public FuzzInvariantException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with what was broken and the exception behind it.</summary>
    public FuzzInvariantException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
