# The N x N square lattice in the naming of `flowcert generate square` (r{row}c{column}; inputs on column 0,
# outputs on the last column), for sizes beyond the generator's 4,000,000-node limit.
# Usage: python3 bench/sparse-scale/lattice.py N OUT.ograph
import sys
n = int(sys.argv[1]); out = open(sys.argv[2], 'w', buffering=1 << 20)
out.write("input " + " ".join(f"r{r}c0" for r in range(n)) + "\n")
out.write("output " + " ".join(f"r{r}c{n-1}" for r in range(n)) + "\n")
for r in range(n):
    buf = []
    for c in range(n):
        if c + 1 < n: buf.append(f"edge r{r}c{c} r{r}c{c+1} 1\n")
        if r + 1 < n: buf.append(f"edge r{r}c{c} r{r+1}c{c} 1\n")
    out.write("".join(buf))
out.close()
