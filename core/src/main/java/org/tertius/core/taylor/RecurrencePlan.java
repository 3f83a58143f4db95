package org.tertius.core.taylor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.Term;

/**
 * The Taylor-coefficient recurrence of a {@link PolynomialSystem}, compiled once: a list of series products
 * (shared sub-monomials computed once, balanced splitting), groups of terms that share a power of the base,
 * and the distinct powers of the base. Kernels run this plan over primitive arrays; the plan itself holds no
 * numbers and no mutable state, so one plan serves every kernel (double or high precision) and every thread.
 *
 * <p>Series are numbered: unknowns {@code 0..n-1}, then products, then groups. Order k of the recurrence:
 * coefficient k of each product and group from coefficients {@code 0..k} of their factors, then
 * {@code F_k = sum_groups (b^j * G)_k}, then {@code y_{k+1} = r F_k / (k+1)} where r is the step scale
 * (the series are in s with tau = tau0 + r s).
 */
public final class RecurrencePlan {
    final IndependentVariable variable;
    final int n;
    /** factor series of each product, in an order where factors come first */
    final int[] prodA;
    final int[] prodB;
    /** for each group: its equation, index into basePowers (or -1 for power 0), and term range */
    final int[] groupEq;
    final int[] groupBase;
    final int[] groupStart;
    /** per group term: coefficient index and series index (-1: the constant 1) */
    final int[] termCoef;
    final int[] termSeries;
    /** the distinct non-zero powers of the base */
    final int[] basePowers;
    final int coefficientCount;

    private RecurrencePlan(PolynomialSystem system) {
        this.variable = system.variable();
        this.n = system.dimension();
        this.coefficientCount = system.coefficientValues().size();
        Map<String, Integer> memo = new HashMap<>();
        List<int[]> prods = new ArrayList<>();
        TreeSet<Integer> powers = new TreeSet<>();
        for (int e = 0; e < n; e++) {
            for (Term t : system.terms(e)) {
                if (t.basePower() != 0) {
                    powers.add(t.basePower());
                }
            }
        }
        basePowers = powers.stream().mapToInt(Integer::intValue).toArray();
        List<Integer> gEq = new ArrayList<>();
        List<Integer> gBase = new ArrayList<>();
        List<Integer> gStart = new ArrayList<>();
        List<Integer> tCoef = new ArrayList<>();
        List<int[]> tMono = new ArrayList<>();
        for (int e = 0; e < n; e++) {
            Map<Integer, List<Term>> byPower = new TreeMap<>();
            for (Term t : system.terms(e)) {
                byPower.computeIfAbsent(t.basePower(), k -> new ArrayList<>()).add(t);
            }
            for (Map.Entry<Integer, List<Term>> en : byPower.entrySet()) {
                gEq.add(e);
                gBase.add(en.getKey() == 0 ? -1 : Arrays.binarySearch(basePowers, en.getKey()));
                gStart.add(tCoef.size());
                for (Term t : en.getValue()) {
                    tCoef.add(t.coefficient());
                    tMono.add(t.exponents());
                }
            }
        }
        gStart.add(tCoef.size());
        // compile monomials to series indices (products numbered after the unknowns)
        int[] series = new int[tMono.size()];
        for (int i = 0; i < tMono.size(); i++) {
            series[i] = monomial(tMono.get(i), memo, prods);
        }
        prodA = new int[prods.size()];
        prodB = new int[prods.size()];
        for (int p = 0; p < prods.size(); p++) {
            prodA[p] = prods.get(p)[0];
            prodB[p] = prods.get(p)[1];
        }
        groupEq = gEq.stream().mapToInt(Integer::intValue).toArray();
        groupBase = gBase.stream().mapToInt(Integer::intValue).toArray();
        groupStart = gStart.stream().mapToInt(Integer::intValue).toArray();
        termCoef = tCoef.stream().mapToInt(Integer::intValue).toArray();
        termSeries = series;
    }

    /** Compiles the plan of a system. */
    public static RecurrencePlan compile(PolynomialSystem system) {
        return new RecurrencePlan(system);
    }

    private int monomial(int[] e, Map<String, Integer> memo, List<int[]> prods) {
        int deg = Arrays.stream(e).sum();
        if (deg == 0) {
            return -1;
        }
        if (deg == 1) {
            for (int v = 0; v < e.length; v++) {
                if (e[v] == 1) {
                    return v;
                }
            }
        }
        String key = Arrays.toString(e);
        Integer known = memo.get(key);
        if (known != null) {
            return known;
        }
        int[] a = new int[e.length];
        int[] b = new int[e.length];
        int degA = 0;
        for (int v = 0; v < e.length; v++) {
            a[v] = e[v] / 2;
            degA += a[v];
        }
        if (degA == 0) {
            for (int v = 0; v < e.length; v++) {
                if (e[v] > 0) {
                    a[v] = 1;
                    break;
                }
            }
        }
        for (int v = 0; v < e.length; v++) {
            b[v] = e[v] - a[v];
        }
        int sa = monomial(a, memo, prods);
        int sb = monomial(b, memo, prods);
        prods.add(new int[] {sa, sb});
        int idx = n + prods.size() - 1;
        memo.put(key, idx);
        return idx;
    }

    public int dimension() {
        return n;
    }

    public IndependentVariable variable() {
        return variable;
    }

    /** Number of series products per order (the cost unit of the recurrence). */
    public int productCount() {
        return prodA.length;
    }

    /** Number of convolutions with a power of the base per order. */
    public int baseConvolutionCount() {
        int c = 0;
        for (int g : groupBase) {
            if (g >= 0) {
                c++;
            }
        }
        return c;
    }

    /** Factor series of product p (first factor). Series numbering as in the class comment. */
    public int productFirst(int p) {
        return prodA[p];
    }

    /** Factor series of product p (second factor). */
    public int productSecond(int p) {
        return prodB[p];
    }

    /** Number of term groups (terms of one equation sharing one power of the base). */
    public int groupCount() {
        return groupEq.length;
    }

    /** The equation group g contributes to. */
    public int groupEquation(int g) {
        return groupEq[g];
    }

    /** Index into {@link #basePower(int)} of group g, or -1 when its power of the base is 0. */
    public int groupBaseIndex(int g) {
        return groupBase[g];
    }

    /** First term of group g; the terms of g are {@code groupStart(g) .. groupStart(g+1)-1}. */
    public int groupStart(int g) {
        return groupStart[g];
    }

    /** Coefficient index of term t. */
    public int termCoefficient(int t) {
        return termCoef[t];
    }

    /** Series index of the monomial of term t, or -1 for the constant monomial 1. */
    public int termSeries(int t) {
        return termSeries[t];
    }

    /** Number of distinct non-zero powers of the base. */
    public int basePowerCount() {
        return basePowers.length;
    }

    /** The q-th distinct non-zero power of the base. */
    public int basePower(int q) {
        return basePowers[q];
    }

    /** Number of coefficient values the plan refers to. */
    public int coefficientCount() {
        return coefficientCount;
    }

    /** Total number of series (unknowns, products, groups). */
    public int seriesCount() {
        return n + prodA.length + groupEq.length;
    }

    /** Series index of group g. */
    public int groupSeries(int g) {
        return n + prodA.length + g;
    }
}
