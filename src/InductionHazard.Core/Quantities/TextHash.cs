using System.Security.Cryptography;
using System.Text;

namespace InductionHazard.Quantities;

/// <summary>SHA-256 of a text (UTF-8), as lower-case hex: how reports fingerprint a policy and the inputs they were made from.</summary>
public static class TextHash
{
    [System.ThreadStatic]
    private static SHA256? _sha;

    /// <summary>The SHA-256 of the text's UTF-8 bytes, 64 hex digits.</summary>
    public static string Sha256(string text)
    {
        _sha ??= SHA256.Create();
        byte[] digest = _sha.ComputeHash(Encoding.UTF8.GetBytes(text));
        const string Digits = "0123456789abcdef";
        var hex = new char[digest.Length * 2];
        for (int i = 0; i < digest.Length; i++)
        {
            hex[2 * i] = Digits[digest[i] >> 4];
            hex[(2 * i) + 1] = Digits[digest[i] & 0xF];
        }

        return new string(hex);
    }

    /// <summary>A number as it round-trips ("R"), for canonical texts.</summary>
    public static string Exact(double value) => value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
