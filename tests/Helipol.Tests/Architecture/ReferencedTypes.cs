using System.Reflection;
using System.Reflection.Emit;

namespace Helipol.Tests.Architecture;

/// <summary>
/// The types one compiled type uses: those in its signatures (base, interfaces, fields, properties,
/// parameters, returns) and those its method bodies name in IL (calls, field loads, allocations, casts).
/// The IL is walked with the opcode table of ECMA-335 Partition III, read from
/// <see cref="OpCodes"/>, so a reference inside a body counts as much as one in a signature.
/// </summary>
internal static class ReferencedTypes
{
    private const BindingFlags All = BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance
        | BindingFlags.Static | BindingFlags.DeclaredOnly;

    private static readonly Dictionary<short, OpCode> Codes = typeof(OpCodes)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Select(f => (OpCode)f.GetValue(null)!)
        .ToDictionary(o => o.Value);

    public static IEnumerable<Type> Of(Type type)
    {
        var found = new HashSet<Type>();
        void Add(Type? t)
        {
            if (t is null) return;
            if (t.HasElementType) { Add(t.GetElementType()); return; }
            if (t.IsGenericParameter) return;
            if (t.IsGenericType && !t.IsGenericTypeDefinition)
            {
                foreach (var a in t.GetGenericArguments()) Add(a);
                t = t.GetGenericTypeDefinition();
            }
            found.Add(t);
        }

        Add(type.BaseType);
        foreach (var i in type.GetInterfaces()) Add(i);
        foreach (var f in type.GetFields(All)) Add(f.FieldType);
        foreach (var p in type.GetProperties(All)) Add(p.PropertyType);
        foreach (var m in type.GetMethods(All).Cast<MethodBase>().Concat(type.GetConstructors(All)))
        {
            if (m is MethodInfo mi) Add(mi.ReturnType);
            foreach (var p in m.GetParameters()) Add(p.ParameterType);
            foreach (var member in InBody(m))
            {
                if (member is Type t) Add(t);
                else { Add(member.DeclaringType); if (member is FieldInfo fi) Add(fi.FieldType); }
            }
        }
        return found;
    }

    /// <summary>Members named by metadata tokens in the method's IL.</summary>
    private static IEnumerable<MemberInfo> InBody(MethodBase method)
    {
        var il = method.GetMethodBody()?.GetILAsByteArray();
        if (il is null) yield break;
        var typeArgs = method.DeclaringType is { IsGenericType: true } d ? d.GetGenericArguments() : null;
        var methodArgs = method.IsGenericMethod ? method.GetGenericArguments() : null;
        int pos = 0;
        while (pos < il.Length)
        {
            short value = il[pos] == 0xFE ? (short)(0xFE00 | il[pos + 1]) : il[pos];
            pos += il[pos] == 0xFE ? 2 : 1;
            var op = Codes[value];
            switch (op.OperandType)
            {
                case OperandType.InlineField:
                case OperandType.InlineMethod:
                case OperandType.InlineTok:
                case OperandType.InlineType:
                    yield return method.Module.ResolveMember(BitConverter.ToInt32(il, pos), typeArgs, methodArgs)!;
                    pos += 4;
                    break;
                case OperandType.InlineNone: break;
                case OperandType.ShortInlineBrTarget:
                case OperandType.ShortInlineI:
                case OperandType.ShortInlineVar: pos += 1; break;
                case OperandType.InlineVar: pos += 2; break;
                case OperandType.InlineI8:
                case OperandType.InlineR: pos += 8; break;
                case OperandType.InlineSwitch: pos += 4 + 4 * BitConverter.ToInt32(il, pos); break;
                default: pos += 4; break;
            }
        }
    }
}
