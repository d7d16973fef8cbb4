namespace MotionSpec.Language.Text;

/// <summary>Finds the first byte that is not part of well-formed UTF-8 (no overlong forms, no surrogates, at most U+10FFFF).</summary>
internal static class Utf8Validator
{
    /// <summary>The offset of the first bad byte, or -1 when all of <paramref name="bytes"/> from <paramref name="start"/> is well formed.</summary>
    public static int FirstInvalid(byte[] bytes, int start)
    {
        var i = start;
        while (i < bytes.Length)
        {
            var b = bytes[i];
            if (b < 0x80)
            {
                i++;
                continue;
            }

            int length;
            int min, max;
            if (b >= 0xC2 && b <= 0xDF)
            {
                length = 2;
                min = 0x80;
                max = 0xBF;
            }
            else if (b >= 0xE0 && b <= 0xEF)
            {
                length = 3;
                min = b == 0xE0 ? 0xA0 : 0x80;
                max = b == 0xED ? 0x9F : 0xBF;
            }
            else if (b >= 0xF0 && b <= 0xF4)
            {
                length = 4;
                min = b == 0xF0 ? 0x90 : 0x80;
                max = b == 0xF4 ? 0x8F : 0xBF;
            }
            else
            {
                return i;
            }

            for (var k = 1; k < length; k++)
            {
                if (i + k >= bytes.Length)
                {
                    return i;
                }

                var c = bytes[i + k];
                var lo = k == 1 ? min : 0x80;
                var hi = k == 1 ? max : 0xBF;
                if (c < lo || c > hi)
                {
                    return i;
                }
            }

            i += length;
        }

        return -1;
    }
}
