using System.Text;

namespace MotionSpec.Cli.Tests;

/// <summary>A fresh folder for one test's files, removed afterwards.</summary>
internal sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "motionspec-cli-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    /// <summary>Writes UTF-8 text (no byte-order mark) and returns the full path.</summary>
    public string Write(string name, string text) => WriteBytes(name, new UTF8Encoding(false).GetBytes(text));

    public string WriteBytes(string name, byte[] bytes)
    {
        var full = System.IO.Path.Combine(Path, name);
        File.WriteAllBytes(full, bytes);
        return full;
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
        }
    }
}
