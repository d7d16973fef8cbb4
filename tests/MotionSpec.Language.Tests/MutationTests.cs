using System.Text;
using CsCheck;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Language.Tests;

/// <summary>
/// Thousands of corrupted specs: whatever the damage, the front end answers with diagnostics and never throws.
/// </summary>
public class MutationTests
{
    private static readonly string[] Splices =
    [
        "frame", "param", "point", "report", "in", "at", "{", "}", "[", "]", "(", ")", "^", "-", "'", "''", "\"",
        "rotate about", "spin", "origin at", ",", ".x", "1.", ".5", "2e", "9 m/s^", "h", "in F", "#", "\n", "\r",
        "\t", "é", "\uD83D\uDE80", "sin(", "atan2(", "x", "0", "/ 0", "^-", "1e400", "via", "basis", "as", "title \"",
    ];

    private static byte[] Mutate(byte[] bytes, int[] operations)
    {
        var list = new List<byte>(bytes);
        foreach (var op in operations)
        {
            var kind = (op & 0x7) % 6;
            var at = list.Count == 0 ? 0 : (int)((uint)op >> 3) % list.Count;
            switch (kind)
            {
                case 0 when list.Count > 0:
                    list[at] ^= (byte)(1 << ((op >> 8) & 7));
                    break;
                case 1 when list.Count > 0:
                    list.RemoveRange(at, Math.Min(1 + ((op >> 12) & 15), list.Count - at));
                    break;
                case 2 when list.Count > 0:
                    var length = Math.Min(1 + ((op >> 12) & 31), list.Count - at);
                    list.InsertRange(at, list.GetRange(at, length));
                    break;
                case 3:
                    list.RemoveRange(at, list.Count - at);
                    break;
                default:
                    list.InsertRange(at, Encoding.UTF8.GetBytes(" " + Splices[(int)((uint)op >> 16) % Splices.Length] + " "));
                    break;
            }
        }

        return list.ToArray();
    }

    [Fact]
    public void Corrupted_specs_give_diagnostics_never_exceptions()
    {
        var seeds = Specs.All.Select(Encoding.UTF8.GetBytes).ToArray();
        Gen.Select(Gen.Int[0, seeds.Length - 1], Gen.Int.Array[1, 12])
            .Sample((seed, operations) =>
            {
                var bytes = Mutate(seeds[seed], operations);
                var bag = new DiagnosticBag();
                var source = FrontEnd.Decode("mutant.motion", bytes, bag);
                if (source is null)
                {
                    Assert.Contains(bag.Items, d => d.Code == LanguageDiagnosticCodes.InvalidUtf8);
                    return;
                }

                FrontEnd.Run(source, bag);
                foreach (var d in bag.Items)
                {
                    Assert.InRange(d.Span.Start, 0, source.Content.Length);
                    Assert.InRange(d.Span.End, d.Span.Start, source.Content.Length);
                    Assert.NotNull(d.Start);
                }
            }, iter: 2000);
    }

    [Fact]
    public void Every_truncation_of_every_sample_is_handled()
    {
        foreach (var spec in Specs.All)
        {
            for (var length = 0; length <= spec.Length; length += 5)
            {
                var bag = new DiagnosticBag();
                FrontEnd.Run(new Text.SourceText("cut.motion", spec.Substring(0, length)), bag);
            }
        }
    }
}
