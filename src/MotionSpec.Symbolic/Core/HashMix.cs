namespace MotionSpec.Symbolic;

/// <summary>Deterministic hash mixing (the same in every process, unlike string.GetHashCode).</summary>
internal static class HashMix
{
    public static int Combine(int a, int b)
    {
        unchecked
        {
            uint h = (uint)a * 0x9E3779B1u;
            h ^= (uint)b + 0x7F4A7C15u + (h << 6) + (h >> 2);
            h ^= h >> 15;
            h *= 0x85EBCA77u;
            h ^= h >> 13;
            return (int)h;
        }
    }

    public static int OfString(string s)
    {
        unchecked
        {
            uint h = 2166136261u;
            foreach (char c in s)
            {
                h = (h ^ c) * 16777619u;
            }

            return (int)h;
        }
    }
}
