#!/usr/bin/env python3
"""Reference for `soakfield bench run`: the same transient job in NumPy/SciPy.

A box of n^3 cells, six linear tetrahedra per cell (the same split as soakfield's structured
mesher is not needed: any six-tetrahedra split of the cube has the same node count and a
similar stencil), D = 1e-9 m^2/s, a 10 mm box, a constant flux into x = 0, every other face
sealed, `steps` backward-Euler steps at dt*D/h^2 = ratio, each solved by SciPy's CG with a
Jacobi preconditioner from the previous step's solution. Prints the wall time of assembly and
of the solves, and the final amount against flux x area x time.

Usage: python3 bench/scipy_reference.py [n] [steps] [ratio] [rtol]
"""
import sys
import time

import numpy as np
import scipy.sparse as sp
import scipy.sparse.linalg as spla

n = int(sys.argv[1]) if len(sys.argv) > 1 else 64
steps = int(sys.argv[2]) if len(sys.argv) > 2 else 100
ratio = float(sys.argv[3]) if len(sys.argv) > 3 else 1.0
rtol = float(sys.argv[4]) if len(sys.argv) > 4 else 1e-8
size, diff, flux = 0.01, 1e-9, 1e-6

t0 = time.perf_counter()
m = n + 1
h = size / n
idx = np.arange(m ** 3).reshape(m, m, m)  # idx[i, j, k], x = i*h
c = idx[:-1, :-1, :-1].ravel()
corner = [c, c + m * m, c + m * m + m, c + m, c + 1, c + m * m + 1, c + m * m + m + 1, c + m + 1]
# the six tetrahedra of the cube around its main diagonal 0-6
split = [(0, 1, 2, 6), (0, 2, 3, 6), (0, 3, 7, 6), (0, 7, 4, 6), (0, 4, 5, 6), (0, 5, 1, 6)]
tets = np.concatenate([np.stack([corner[a], corner[b], corner[e], corner[f]], 1)
                       for a, b, e, f in split])
g = np.stack(np.meshgrid(np.arange(m), np.arange(m), np.arange(m), indexing="ij"), -1)
xyz = g.reshape(-1, 3) * h
p = xyz[tets]                       # (T, 4, 3)
e = p[:, 1:] - p[:, :1]             # (T, 3, 3)
vol = np.abs(np.linalg.det(e)) / 6
grads = np.linalg.inv(e)            # rows: gradients of barycentric 1..3
gr = np.concatenate([-grads.sum(1, keepdims=True), grads], 1)  # (T, 4, 3)
ke = diff * np.einsum("tik,tjk->tij", gr, gr) * vol[:, None, None]
me = (np.ones((4, 4)) + np.eye(4))[None] * (vol / 20)[:, None, None]
rows = np.repeat(tets, 4, 1).ravel()
cols = np.tile(tets, (1, 4)).ravel()
K = sp.csr_matrix((ke.ravel(), (rows, cols)), shape=(m ** 3,) * 2)
M = sp.csr_matrix((me.ravel(), (rows, cols)), shape=(m ** 3,) * 2)
dt = ratio * h * h / diff
A = (M + dt * K).tocsr()
# flux load on x = 0, lumped: each node takes a quarter of each h x h square around it
# (the total, flux x area, is what the amount check needs)
w = np.zeros((m, m))
w[:-1, :-1] += 1
w[1:, :-1] += 1
w[:-1, 1:] += 1
w[1:, 1:] += 1
load = np.zeros(m ** 3)
load[idx[0].ravel()] = flux * (w * h * h / 4).ravel()
jacobi = sp.diags(1 / A.diagonal())
assembly = time.perf_counter() - t0

phi = np.zeros(m ** 3)
iterations = 0
t1 = time.perf_counter()
for _ in range(steps):
    count = [0]

    def callback(_x):
        count[0] += 1

    phi, info = spla.cg(A, M @ phi + dt * load, x0=phi, rtol=rtol, M=jacobi, callback=callback)
    if info != 0:
        raise SystemExit("CG did not converge")
    iterations += count[0]
solves = time.perf_counter() - t1
amount = np.asarray(M.sum(0)).ravel() @ phi
expected = flux * size * size * steps * dt
print(f"{len(tets)} tetrahedra, {m ** 3} nodes, {steps} steps at dt*D/h^2 = {ratio}")
print(f"assembly {assembly:.2f} s, solves {solves:.2f} s ({iterations} iterations,"
      f" {iterations / steps:.1f} per step), whole {assembly + solves:.2f} s")
print(f"amount {amount:.9e} against flux x area x time {expected:.9e}:"
      f" relative difference {abs(amount - expected) / expected:.1e}")
