using System.Buffers.Binary;
using System.Reflection;
using System.Text;

namespace LunarShadow.Astronomy.Embedded;

/// <summary>
/// Reads the compact tables written by tools/ephemeris-import: magic "LSBLOCK1", a block count, then
/// named blocks of rows × columns little-endian float64 values.
/// </summary>
internal sealed class BlockFile
{
    private readonly Dictionary<string, double[][]> _blocks;

    private BlockFile(Dictionary<string, double[][]> blocks) => _blocks = blocks;

    /// <summary>Names of the blocks, in file order.</summary>
    public IReadOnlyCollection<string> Names => _blocks.Keys;

    /// <summary>The rows of a named block.</summary>
    public double[][] this[string name] => _blocks[name];

    /// <summary>Whether a block exists.</summary>
    public bool Contains(string name) => _blocks.ContainsKey(name);

    /// <summary>Reads an embedded resource of this assembly by its logical name.</summary>
    public static BlockFile FromResource(string logicalName) => Parse(ReadResource(logicalName));

    /// <summary>The raw bytes of an embedded resource of this assembly.</summary>
    public static byte[] ReadResource(string logicalName)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(logicalName)
            ?? throw new InvalidOperationException($"Embedded data '{logicalName}' is missing from the build.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }

    /// <summary>Parses a block file.</summary>
    public static BlockFile Parse(ReadOnlySpan<byte> bytes)
    {
        if (bytes.Length < 12 || Encoding.ASCII.GetString(bytes[..8]) != "LSBLOCK1")
            throw new InvalidDataException("Not a LunarShadow block file.");
        var count = BinaryPrimitives.ReadInt32LittleEndian(bytes[8..]);
        var position = 12;
        var blocks = new Dictionary<string, double[][]>(count);
        for (var b = 0; b < count; b++)
        {
            int nameLength = bytes[position];
            var name = Encoding.ASCII.GetString(bytes.Slice(position + 1, nameLength));
            position += 1 + nameLength;
            var rows = BinaryPrimitives.ReadInt32LittleEndian(bytes[position..]);
            var columns = BinaryPrimitives.ReadInt32LittleEndian(bytes[(position + 4)..]);
            position += 8;
            var table = new double[rows][];
            for (var r = 0; r < rows; r++)
            {
                var row = new double[columns];
                for (var c = 0; c < columns; c++, position += 8)
                    row[c] = BinaryPrimitives.ReadDoubleLittleEndian(bytes[position..]);
                table[r] = row;
            }
            blocks.Add(name, table);
        }
        return new BlockFile(blocks);
    }
}
