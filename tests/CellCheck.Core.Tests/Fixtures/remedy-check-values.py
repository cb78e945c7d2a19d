# Check values for the Yeo-Johnson likelihood from scipy 1.10.1 (Debian python3-scipy). Run: /usr/bin/python3 remedy-check-values.py
import numpy as np
from scipy import stats

# the statsmodels test sample of the shared reference set (Anderson-Darling section)
x = np.array([-0.1184, -1.3403, 0.0063, -0.612, -0.3869, -0.2313, -2.8485, -0.2167, 0.4153, 1.8492,
              -0.3706, 0.9726, -0.1501, -0.0337, -1.4423, 1.2489, 0.9182, -0.2331, -0.6182, 0.183])
for l in [-1.0, 0.0, 0.5, 1.0, 2.0, 3.0]:
    print("yeojohnson_llf", l, repr(float(stats.yeojohnson_llf(l, x))))
print("yeojohnson lambda", repr(stats.yeojohnson(x)[1]))
print("yeojohnson(-0.5, 2.5)", repr(stats.yeojohnson(np.array([-0.5]), 2.5)[0]))
print("yeojohnson(3, 0)", repr(stats.yeojohnson(np.array([3.0]), 0.0)[0]))
