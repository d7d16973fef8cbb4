using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Compiler;

/// <summary>The outcome of checking one spec: its diagnostics and, when it has no errors, its closed forms.</summary>
public sealed class CheckedSpec
{
    internal CheckedSpec(string path, SourceText? source, BoundSpec? bound, KinematicModel? model, IReadOnlyList<Diagnostic> diagnostics)
    {
        Path = path;
        Source = source;
        Bound = bound;
        Diagnostics = diagnostics;
        HasErrors = diagnostics.Any(d => d.IsError);
        Model = HasErrors ? null : model;
    }

    /// <summary>The path as given.</summary>
    public string Path { get; }

    /// <summary>The decoded text; null when the bytes were not UTF-8.</summary>
    public SourceText? Source { get; }

    /// <summary>The bound spec; null when the text could not be bound.</summary>
    public BoundSpec? Bound { get; }

    /// <summary>The closed forms; non-null exactly when there are no errors.</summary>
    public KinematicModel? Model { get; }

    /// <summary>Every diagnostic, sorted by position.</summary>
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>True when any diagnostic is an error.</summary>
    public bool HasErrors { get; }

    /// <summary>The title, else the file's base name without extension.</summary>
    public string DisplayName => Bound?.Title ?? System.IO.Path.GetFileNameWithoutExtension(Path);
}
