using Integrable.Clusters;

namespace Integrable.Tests.Clusters;

public class MutationSequenceTests
{
    [Theory]
    [InlineData("1 2 3", new[] { 1, 2, 3 })]
    [InlineData("1,3,2", new[] { 1, 3, 2 })]
    [InlineData(" [2, 1 , 2] ", new[] { 2, 1, 2 })]
    [InlineData("(4)", new[] { 4 })]
    [InlineData("", new int[0])]
    [InlineData("[]", new int[0])]
    public void Parse_AcceptedForms(string text, int[] expected) => Assert.Equal(expected, MutationSequence.Parse(text));

    [Theory]
    [InlineData("1 -2", 2)]
    [InlineData("1,,2", 2)]
    [InlineData("1,", 2)]
    [InlineData("[1 2", 4)]
    [InlineData("1 2]", 3)]
    [InlineData("0", 0)]
    [InlineData("99999999999", 0)]
    [InlineData("1 a", 2)]
    public void Parse_Malformed_ThrowsWithPosition(string text, int position)
    {
        var e = Assert.Throws<ClusterFormatException>(() => MutationSequence.Parse(text));
        Assert.Equal(position, e.Position);
    }

    [Fact]
    public void Parse_Null_Throws() => Assert.Throws<ArgumentNullException>(() => MutationSequence.Parse(null!));
}
