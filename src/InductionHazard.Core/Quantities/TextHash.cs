using System.Security.Cryptography;
using System.Text;

namespace InductionHazard.Quantities;

/// <summary>SHA-256 of a text (UTF-8), as lower-case hex: how reports fingerprint a policy and the inputs they were made from.</summary>
public static class TextHash
{
    /// <summary>The SHA-256 of the text's UTF-8 bytes, 64 hex digits.</summary>
    public static string Sha256(string text)
    {
        using var sha = SHA256.Create();
        byte[] digest = sha.ComputeHash(Encoding.UTF8.GetBytes(text));
        var hex = new StringBuilder(digest.Length * 2);
        foreach (byte b in digest)
        {
            hex.Append(b.ToString("x2", System.Globalization.CultureInfo.InvariantCulture));
        }

        return hex.ToString();
    }

    /// <summary>A number as it round-trips ("R"), for canonical texts.</summary>
    public static string Exact(double value) => value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
