package org.eigenzeit.bench.ops;

import java.lang.instrument.ClassFileTransformer;
import java.security.ProtectionDomain;
import org.objectweb.asm.ClassReader;
import org.objectweb.asm.ClassVisitor;
import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.MethodVisitor;
import org.objectweb.asm.Opcodes;

/**
 * Rewrites the classes of one package tree so that, before each counted instruction, the
 * counter of its kind in {@link OpCounter#COUNTS} is incremented. Counted:
 *
 * <ul>
 *   <li>double arithmetic: DADD ("add"), DSUB ("sub"), DMUL ("mul"), DDIV ("div"), DREM ("rem"),
 *       DNEG ("neg"); float arithmetic likewise with an "f" prefix ("fadd", ...);
 *   <li>comparisons: DCMPL and DCMPG ("cmp"), FCMPL and FCMPG ("fcmp");
 *   <li>conversions to or from double: I2D, L2D, F2D, D2I, D2L, D2F ("conv");
 *   <li>static calls to java.lang.Math, java.lang.StrictMath and java.lang.Double, by name
 *       ("Math.sqrt", "StrictMath.sin", "Double.isFinite", ...).
 * </ul>
 *
 * The inserted code (GETSTATIC, constant, DUP2, LALOAD, LCONST_1, LADD, LASTORE) leaves the
 * operand stack as it found it and adds no branch, so the method's stack map frames stay valid;
 * ASM recomputes the maximum stack depth. Integer and long arithmetic is not counted.
 */
public final class OpCountTransformer implements ClassFileTransformer {
  private static final String COUNTER = OpCounter.class.getName().replace('.', '/');
  /** Classes that could not be rewritten (they then load uncounted: the run must refuse). */
  static final java.util.concurrent.atomic.AtomicInteger FAILURES = new java.util.concurrent.atomic.AtomicInteger();
  private final String prefix;

  /**
   * Creates a transformer.
   *
   * @param internalPrefix internal name prefix of the classes to rewrite, e.g.
   *     "org/eigenzeit/onboard/"
   */
  public OpCountTransformer(String internalPrefix) {
    this.prefix = internalPrefix;
  }

  @Override
  public byte[] transform(ClassLoader loader, String className, Class<?> redefined, ProtectionDomain domain,
      byte[] classfile) {
    if (className == null || !className.startsWith(prefix)) {
      return null;
    }
    try {
      return instrument(classfile);
    } catch (RuntimeException | LinkageError e) {
      FAILURES.incrementAndGet();
      System.err.println("op counter: cannot instrument " + className + ": " + e);
      return null;
    }
  }

  /**
   * Rewrites one class file.
   *
   * @param classfile the original bytes
   * @return the instrumented bytes
   */
  public static byte[] instrument(byte[] classfile) {
    final ClassReader reader = new ClassReader(classfile);
    final ClassWriter writer = new ClassWriter(reader, ClassWriter.COMPUTE_MAXS);
    reader.accept(new ClassVisitor(Opcodes.ASM9, writer) {
      @Override
      public MethodVisitor visitMethod(int access, String name, String descriptor, String signature,
          String[] exceptions) {
        return new Counting(super.visitMethod(access, name, descriptor, signature, exceptions));
      }
    }, 0);
    return writer.toByteArray();
  }

  /** The kind of an instruction, or null when it is not counted. */
  static String kind(int opcode) {
    return switch (opcode) {
      case Opcodes.DADD -> "add";
      case Opcodes.DSUB -> "sub";
      case Opcodes.DMUL -> "mul";
      case Opcodes.DDIV -> "div";
      case Opcodes.DREM -> "rem";
      case Opcodes.DNEG -> "neg";
      case Opcodes.DCMPL, Opcodes.DCMPG -> "cmp";
      case Opcodes.FADD -> "fadd";
      case Opcodes.FSUB -> "fsub";
      case Opcodes.FMUL -> "fmul";
      case Opcodes.FDIV -> "fdiv";
      case Opcodes.FREM -> "frem";
      case Opcodes.FNEG -> "fneg";
      case Opcodes.FCMPL, Opcodes.FCMPG -> "fcmp";
      case Opcodes.I2D, Opcodes.L2D, Opcodes.F2D, Opcodes.D2I, Opcodes.D2L, Opcodes.D2F -> "conv";
      default -> null;
    };
  }

  /** The kind of a static call, or null when it is not counted. */
  static String call(String owner, String name) {
    return switch (owner) {
      case "java/lang/Math" -> "Math." + name;
      case "java/lang/StrictMath" -> "StrictMath." + name;
      case "java/lang/Double" -> "Double." + name;
      default -> null;
    };
  }

  /** Inserts the increments. */
  private static final class Counting extends MethodVisitor {
    Counting(MethodVisitor next) {
      super(Opcodes.ASM9, next);
    }

    private void increment(String kind) {
      super.visitFieldInsn(Opcodes.GETSTATIC, COUNTER, "COUNTS", "[J");
      super.visitLdcInsn(OpCounter.slot(kind));
      super.visitInsn(Opcodes.DUP2);
      super.visitInsn(Opcodes.LALOAD);
      super.visitInsn(Opcodes.LCONST_1);
      super.visitInsn(Opcodes.LADD);
      super.visitInsn(Opcodes.LASTORE);
    }

    @Override
    public void visitInsn(int opcode) {
      final String k = kind(opcode);
      if (k != null) {
        increment(k);
      }
      super.visitInsn(opcode);
    }

    @Override
    public void visitMethodInsn(int opcode, String owner, String name, String descriptor, boolean isInterface) {
      if (opcode == Opcodes.INVOKESTATIC) {
        final String k = call(owner, name);
        if (k != null) {
          increment(k);
        }
      }
      super.visitMethodInsn(opcode, owner, name, descriptor, isInterface);
    }
  }
}
