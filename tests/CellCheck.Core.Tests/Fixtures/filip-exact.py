"""Exact least-squares solution of NIST StRD Filip as stored in double precision.

Run from this folder: python3 filip-exact.py
Each value of Filip.dat is parsed to the nearest double, the design 1, x, x^2, ..., x^10 is formed by repeated
multiplication in double (as the C# test does; both follow IEEE 754 binary64 with rounding to nearest), and the
normal equations X'X b = X'y are then solved exactly in rational arithmetic. The result is the least-squares solution
of the data exactly as a double-precision program holds them, printed with 17 significant digits, and its log
relative error against the certified values.
"""
import math
import re
from fractions import Fraction

lines = open("nist-strd/Filip.dat").read().splitlines()
rows = [list(map(float, l.split())) for l in lines[60:142]]
certified = [float(m.group(1)) for m in (re.match(r"^\s*B\d+\s+(\S+)\s+\S+\s*$", l) for l in lines[30:55]) if m]

design = []
for _, x in rows:
    power, row = 1.0, []
    for _ in range(11):
        row.append(Fraction(power))
        power *= x
    design.append(row)
y = [Fraction(r[0]) for r in rows]

p = 11
m = [[sum(r[j] * r[k] for r in design) for k in range(p)] + [sum(r[j] * yi for r, yi in zip(design, y))] for j in range(p)]
for c in range(p):
    for r in range(p):
        if r != c:
            f = m[r][c] / m[c][c]
            m[r] = [a - f * b for a, b in zip(m[r], m[c])]
solution = [float(m[j][p] / m[j][j]) for j in range(p)]
print(" ".join(format(b, ".17g") for b in solution))
print("min LRE against certified: %.2f" % min(-math.log10(abs(b - c) / abs(c)) for b, c in zip(solution, certified)))
