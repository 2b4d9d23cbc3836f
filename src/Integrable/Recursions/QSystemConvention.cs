namespace Integrable.Recursions;

/// <summary>The sign in front of the product term of a Q-system
/// Q_{a,n+1}·Q_{a,n−1} = Q_{a,n}^2 ∓ Π_b Π_k Q_{b,m(b,k,n)} (see <see cref="QSystem"/>).</summary>
public enum QSystemConvention
{
    /// <summary>The minus sign of Kirillov and Reshetikhin: with Q_{a,0} = 1 and Q_{a,1} = dim W^{(a)}_1
    /// the solution is the family of dimensions (and characters) of the Kirillov–Reshetikhin modules
    /// W^{(a)}_n (Hatayama–Kuniba–Okado–Takagi–Yamada, Remarks on fermionic formula, 1999).</summary>
    KirillovReshetikhin,

    /// <summary>The plus sign: the Q-system as a cluster algebra, whose solutions are Laurent polynomials
    /// with non-negative coefficients in any initial data Q_{a,0}, Q_{a,1} (Kedem, Q-systems as cluster
    /// algebras, 2008; Di Francesco–Kedem, Q-systems as cluster algebras II, 2009).</summary>
    Cluster,
}
