using System.Text;
using MotionSpec.Kinematics;
using MotionSpec.Language;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Compiler;

/// <summary>
/// The one entry point of the compiler: decode, tokenize, parse, bind, derive. The command line, the source
/// generator and the tests all check specs through here.
/// </summary>
public static class SpecCompiler
{
    // Deep but legal specs (hundreds of nested frames or parentheses) recurse in places; a large private stack
    // keeps that from ever overflowing the caller's.
    private const int StackBytes = 256 * 1024 * 1024;

    /// <summary>Checks a spec given as the bytes of its file.</summary>
    public static CheckedSpec Check(string path, byte[] bytes) => OnLargeStack(() => Run(path, bytes));

    /// <summary>Checks a spec given as text.</summary>
    public static CheckedSpec Check(string path, string text) => OnLargeStack(() => Run(path, new UTF8Encoding(false).GetBytes(text)));

    private static CheckedSpec Run(string path, byte[] bytes)
    {
        var diagnostics = new DiagnosticBag();
        var source = FrontEnd.Decode(path, bytes, diagnostics);
        BoundSpec? bound = null;
        KinematicModel? model = null;
        if (source is not null)
        {
            bound = FrontEnd.Run(source, diagnostics);
            if (bound is not null && !diagnostics.HasErrors)
            {
                model = KinematicsPass.Run(bound, diagnostics);
            }
        }

        return new CheckedSpec(path, source, bound, model, diagnostics.Sorted());
    }

    private static CheckedSpec OnLargeStack(Func<CheckedSpec> work)
    {
        CheckedSpec? result = null;
        System.Runtime.ExceptionServices.ExceptionDispatchInfo? failure = null;
        var thread = new Thread(
            () =>
            {
                // A defect must surface on the caller's thread (where the command line reports it), not kill the process here.
#pragma warning disable CA1031
                try
                {
                    result = work();
                }
                catch (Exception e)
                {
                    failure = System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e);
                }
#pragma warning restore CA1031
            },
            StackBytes);
        thread.Start();
        thread.Join();
        failure?.Throw();
        return result!;
    }
}
