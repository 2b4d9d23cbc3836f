using System.Globalization;

namespace Integrable.Clusters;

public sealed partial class ExchangeMatrix
{
    /// <summary>The Markov quiver: three vertices with a double arrow 1→2, 2→3, 3→1,
    /// B = [[0,2,−2],[−2,0,2],[2,−2,0]]. Every mutation gives −B.</summary>
    public static ExchangeMatrix Markov { get; } = FromRows(3, 0, [0, 2, -2, -2, 0, 2, 2, -2, 0]);

    /// <summary>The Kronecker quiver: two vertices with a double arrow 1→2, B = [[0,2],[−2,0]]
    /// (affine type Ã_1).</summary>
    public static ExchangeMatrix Kronecker { get; } = FromRows(2, 0, [0, 2, -2, 0]);

    /// <summary>The exchange matrix of a finite (Dynkin) type with the bipartite orientation:
    /// b_ij = −ε(i)·a_ij for i ≠ j, where A is the Cartan matrix and ε = +1 on the colour class of
    /// vertex 1 (those vertices are sources).</summary>
    /// <param name="family">One of A, B, C, D, E, F, G (case-insensitive).</param>
    /// <param name="rank">The rank n: A n ≥ 1; B, C n ≥ 2; D n ≥ 4; E n ∈ {6, 7, 8}; F n = 4; G n = 2.</param>
    /// <returns>The n×n exchange matrix.</returns>
    /// <remarks>Cartan matrices follow a_ij = 2(α_i, α_j)/(α_i, α_i) with Bourbaki's numbering of the
    /// simple roots (α_n short in B_n, long in C_n; α_1, α_2 long in F_4; α_1 short in G_2; in D_n the
    /// vertices n−1 and n both join n−2; in E_n vertex 2 joins 4 and 1–3–4–5–…–n is a path). The cluster
    /// algebra is of the named finite type (Fomin–Zelevinsky, Cluster algebras II, 2003).</remarks>
    /// <exception cref="ArgumentException">The family is unknown or the rank is not allowed for it.</exception>
    public static ExchangeMatrix FiniteType(char family, int rank) => FromCartanMatrix(CartanMatrix(family, rank));

    /// <summary>The exchange matrix of a finite type given by name, e.g. <c>A5</c>, <c>D_4</c>, <c>E8</c>.</summary>
    /// <param name="name">A family letter followed by the rank, with an optional underscore.</param>
    /// <returns>The exchange matrix (see <see cref="FiniteType(char, int)"/>).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException">The name is not a finite type.</exception>
    public static ExchangeMatrix FiniteType(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var s = name.Trim();
        var digits = s.Length >= 2 && s[1] == '_' ? s[2..] : s.Length >= 1 ? s[1..] : "";
        if (s.Length < 2 || !int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out int rank))
            throw new ArgumentException(
                $"'{name}' is not a finite type name; expected a letter A-G followed by the rank, e.g. A5, D_4, E8", nameof(name));
        return FiniteType(s[0], rank);
    }

    /// <summary>A named exchange matrix: a finite type (<c>A5</c>, <c>E_8</c>, …), <c>Markov</c> or
    /// <c>Kronecker</c> (case-insensitive).</summary>
    /// <param name="name">The name.</param>
    /// <returns>The exchange matrix.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException">The name is not known.</exception>
    public static ExchangeMatrix Named(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var s = name.Trim();
        if (s.Equals("Markov", StringComparison.OrdinalIgnoreCase)) return Markov;
        if (s.Equals("Kronecker", StringComparison.OrdinalIgnoreCase)) return Kronecker;
        try
        {
            return FiniteType(s);
        }
        catch (ArgumentException e)
        {
            throw new ArgumentException($"unknown exchange matrix name '{name}': {e.Message}; other names: Markov, Kronecker", nameof(name), e);
        }
    }

    /// <summary>The exchange matrix of a generalised Cartan matrix A: b_ij = −ε(i)·a_ij for i ≠ j, where
    /// ε is a bipartite colouring of the diagram (+1 on the class of the lowest vertex of each component,
    /// so those vertices are sources) when the diagram is bipartite; otherwise every edge is oriented
    /// from the lower to the higher index (b_ij = −a_ij and b_ji = a_ji for i &lt; j). Both orientations
    /// are acyclic, and DB is skew-symmetric for any D that symmetrises A.</summary>
    /// <param name="cartan">A square matrix with a_ii = 2, a_ij ≤ 0 for i ≠ j, a_ij = 0 exactly when a_ji = 0,
    /// and symmetrisable.</param>
    /// <returns>The exchange matrix with no frozen rows.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="cartan"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="cartan"/> is not a generalised Cartan matrix;
    /// the message names the entry.</exception>
    /// <exception cref="NotSkewSymmetrizableException">A is not symmetrisable.</exception>
    public static ExchangeMatrix FromCartanMatrix(int[,] cartan)
    {
        ArgumentNullException.ThrowIfNull(cartan);
        int n = cartan.GetLength(0);
        if (n < 1 || cartan.GetLength(1) != n)
            throw new ArgumentException($"a Cartan matrix must be square and non-empty, got {n}×{cartan.GetLength(1)}", nameof(cartan));
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                int a = cartan[i, j];
                if (i == j ? a != 2 : a > 0 || (a == 0) != (cartan[j, i] == 0) || a == int.MinValue)
                    throw new ArgumentException(
                        $"entry a_{i + 1},{j + 1} = {a} is not allowed in a generalised Cartan matrix " +
                        "(a_ii = 2; a_ij <= 0 off the diagonal; a_ij = 0 exactly when a_ji = 0)", nameof(cartan));
            }

        // Try a bipartite colouring; colour[i] = +1 for sources.
        var colour = new int[n];
        bool bipartite = true;
        var queue = new Queue<int>();
        for (int root = 0; root < n && bipartite; root++)
        {
            if (colour[root] != 0) continue;
            colour[root] = 1;
            queue.Enqueue(root);
            while (queue.Count > 0 && bipartite)
            {
                int i = queue.Dequeue();
                for (int j = 0; j < n; j++)
                {
                    if (j == i || cartan[i, j] == 0) continue;
                    if (colour[j] == 0) { colour[j] = -colour[i]; queue.Enqueue(j); }
                    else if (colour[j] == colour[i]) { bipartite = false; break; }
                }
            }
        }

        var b = new int[n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                if (i == j || cartan[i, j] == 0) continue;
                int sign = bipartite ? colour[i] : (i < j ? 1 : -1);
                b[i * n + j] = -sign * cartan[i, j];
            }
        return FromRows(n, 0, b);
    }

    /// <summary>The Cartan matrix of a finite type, a_ij = 2(α_i, α_j)/(α_i, α_i), Bourbaki numbering.</summary>
    internal static int[,] CartanMatrix(char family, int rank)
    {
        char f = char.ToUpperInvariant(family);
        (int Lo, int Hi) allowed = f switch
        {
            'A' => (1, int.MaxValue),
            'B' or 'C' => (2, int.MaxValue),
            'D' => (4, int.MaxValue),
            'E' => (6, 8),
            'F' => (4, 4),
            'G' => (2, 2),
            _ => throw new ArgumentException(
                $"unknown Dynkin family '{family}'; expected one of A, B, C, D, E, F, G", nameof(family)),
        };
        if (rank < allowed.Lo || rank > allowed.Hi)
            throw new ArgumentOutOfRangeException(nameof(rank), rank,
                $"type {f} needs rank " + (allowed.Lo == allowed.Hi ? $"{allowed.Lo}"
                    : allowed.Hi == int.MaxValue ? $">= {allowed.Lo}" : $"in {allowed.Lo}..{allowed.Hi}"));
        int n = rank;
        var a = new int[n, n];
        for (int i = 0; i < n; i++) a[i, i] = 2;
        void Join(int i, int j) { a[i - 1, j - 1] = -1; a[j - 1, i - 1] = -1; }
        switch (f)
        {
            case 'A':
            case 'B':
            case 'C':
            case 'F':
            case 'G':
                for (int i = 1; i < n; i++) Join(i, i + 1);
                break;
            case 'D':
                for (int i = 1; i < n - 1; i++) Join(i, i + 1);
                Join(n - 2, n);
                break;
            case 'E':
                Join(1, 3);
                Join(2, 4);
                for (int i = 3; i < n; i++) Join(i, i + 1);
                break;
        }
        switch (f)
        {
            case 'B': a[n - 1, n - 2] = -2; break;   // α_n short
            case 'C': a[n - 2, n - 1] = -2; break;   // α_n long
            case 'F': a[2, 1] = -2; break;           // α_2 long, α_3 short
            case 'G': a[0, 1] = -3; break;           // α_1 short, α_2 long
        }
        return a;
    }
}
