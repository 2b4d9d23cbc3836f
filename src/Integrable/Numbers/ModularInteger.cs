using Integrable.Algebra;

namespace Integrable.Numbers;

/// <summary>An element of a prime field Z/pZ together with its field, with the usual operators; meant
/// for interactive use (hot loops work on raw residues through <see cref="PrimeField"/>).</summary>
/// <example><code>
/// var f = new PrimeField(101);
/// var x = f.Element(3);
/// var y = x / f.Element(7) + 1;
/// </code></example>
public readonly struct ModularInteger : IRingElement<ModularInteger>
{
    /// <summary>Creates the element with residue <paramref name="residue"/> of <paramref name="field"/>.</summary>
    /// <param name="field">The field.</param>
    /// <param name="residue">A residue in [0, p).</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="residue"/> is not reduced.</exception>
    public ModularInteger(PrimeField field, ulong residue)
    {
        ArgumentNullException.ThrowIfNull(field);
        if (residue >= field.Modulus) throw new ArgumentOutOfRangeException(nameof(residue), residue, $"residue must be below {field.Modulus}");
        Field = field;
        Residue = residue;
    }

    /// <summary>The field this element belongs to.</summary>
    public PrimeField Field { get; }

    /// <summary>The residue in [0, p).</summary>
    public ulong Residue { get; }

    /// <inheritdoc/>
    public bool IsZero => Residue == 0;

    /// <inheritdoc/>
    public bool IsOne => Residue == 1;

    private static PrimeField Common(ModularInteger a, ModularInteger b)
    {
        if (a.Field is null || b.Field is null) throw new InvalidOperationException("uninitialised ModularInteger");
        if (!a.Field.Equals(b.Field)) throw new IncompatibleRingException($"cannot combine elements of {a.Field} and {b.Field}");
        return a.Field;
    }

    /// <summary>Sum.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns>The sum in the common field.</returns>
    /// <exception cref="IncompatibleRingException">Different fields.</exception>
    public static ModularInteger operator +(ModularInteger a, ModularInteger b) { var f = Common(a, b); return new(f, f.Add(a.Residue, b.Residue)); }

    /// <summary>Difference.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns>The difference.</returns>
    /// <exception cref="IncompatibleRingException">Different fields.</exception>
    public static ModularInteger operator -(ModularInteger a, ModularInteger b) { var f = Common(a, b); return new(f, f.Subtract(a.Residue, b.Residue)); }

    /// <summary>Product.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns>The product.</returns>
    /// <exception cref="IncompatibleRingException">Different fields.</exception>
    public static ModularInteger operator *(ModularInteger a, ModularInteger b) { var f = Common(a, b); return new(f, f.Multiply(a.Residue, b.Residue)); }

    /// <summary>Quotient.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Non-zero divisor.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is zero.</exception>
    public static ModularInteger operator /(ModularInteger a, ModularInteger b) { var f = Common(a, b); return new(f, f.Divide(a.Residue, b.Residue)); }

    /// <summary>Negation.</summary>
    /// <param name="a">The element.</param>
    /// <returns>−a.</returns>
    public static ModularInteger operator -(ModularInteger a) => new(a.Field, a.Field.Negate(a.Residue));

    /// <summary>Adds an integer.</summary>
    /// <param name="a">The element.</param>
    /// <param name="b">The integer.</param>
    /// <returns>a + b.</returns>
    public static ModularInteger operator +(ModularInteger a, long b) => a + a.Field.Element(b);

    /// <summary>Multiplies by an integer.</summary>
    /// <param name="a">The element.</param>
    /// <param name="b">The integer.</param>
    /// <returns>a·b.</returns>
    public static ModularInteger operator *(ModularInteger a, long b) => a * a.Field.Element(b);

    /// <summary>Power; negative exponents invert.</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^exponent.</returns>
    public ModularInteger Pow(long exponent) => new(Field, Field.Pow(Residue, exponent));

    /// <summary>Equality (same field and residue).</summary>
    /// <param name="a">Left.</param>
    /// <param name="b">Right.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(ModularInteger a, ModularInteger b) => a.Equals(b);

    /// <summary>Inequality.</summary>
    /// <param name="a">Left.</param>
    /// <param name="b">Right.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(ModularInteger a, ModularInteger b) => !a.Equals(b);

    /// <inheritdoc/>
    public bool Equals(ModularInteger other) => Residue == other.Residue && Equals(Field, other.Field);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is ModularInteger m && Equals(m);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Residue, Field?.Modulus);

    /// <summary>Text such as <c>5 (mod 101)</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => $"{Residue} (mod {Field?.Modulus})";
}
