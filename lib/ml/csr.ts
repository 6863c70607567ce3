// Compressed sparse rows on typed arrays: the only matrix shape lib/ml uses for documents, so a
// documents × vocabulary matrix is never dense. Row i holds indices[indptr[i]..indptr[i+1]).

export interface CsrMatrix {
  rows: number;
  cols: number;
  indptr: Int32Array;
  indices: Int32Array;
  data: Float64Array;
}

/** Builds a CSR matrix from per-row (column, value) lists; columns need not be sorted. */
export function buildCsr(rowsOfEntries: Array<Array<[number, number]>>, cols: number): CsrMatrix {
  let nnz = 0;
  for (const row of rowsOfEntries) nnz += row.length;
  const indptr = new Int32Array(rowsOfEntries.length + 1);
  const indices = new Int32Array(nnz);
  const data = new Float64Array(nnz);
  let k = 0;
  rowsOfEntries.forEach((row, i) => {
    // Sorted columns make exports and comparisons deterministic.
    const sorted = [...row].sort((a, b) => a[0] - b[0]);
    for (const [col, value] of sorted) {
      if (col < 0 || col >= cols) throw new Error(`Column ${col} is outside 0..${cols - 1}.`);
      indices[k] = col;
      data[k] = value;
      k++;
    }
    indptr[i + 1] = k;
  });
  return { rows: rowsOfEntries.length, cols, indptr, indices, data };
}

/** Builds a CSR matrix from dense rows, keeping only non-zeros (for small dense data such as Iris). */
export function buildCsrFromDense(dense: number[][]): CsrMatrix {
  const cols = dense.length > 0 ? dense[0].length : 0;
  const entries = dense.map((row) => {
    if (row.length !== cols) throw new Error("All dense rows must have the same length.");
    const out: Array<[number, number]> = [];
    row.forEach((v, j) => {
      if (v !== 0) out.push([j, v]);
    });
    return out;
  });
  return buildCsr(entries, cols);
}

/** Returns the rows at the given positions as a new matrix (folds, slices). */
export function selectRows(x: CsrMatrix, rowIds: ArrayLike<number>): CsrMatrix {
  let nnz = 0;
  for (let r = 0; r < rowIds.length; r++) nnz += x.indptr[rowIds[r] + 1] - x.indptr[rowIds[r]];
  const indptr = new Int32Array(rowIds.length + 1);
  const indices = new Int32Array(nnz);
  const data = new Float64Array(nnz);
  let k = 0;
  for (let r = 0; r < rowIds.length; r++) {
    const start = x.indptr[rowIds[r]];
    const end = x.indptr[rowIds[r] + 1];
    indices.set(x.indices.subarray(start, end), k);
    data.set(x.data.subarray(start, end), k);
    k += end - start;
    indptr[r + 1] = k;
  }
  return { rows: rowIds.length, cols: x.cols, indptr, indices, data };
}

/** out[i] = x_i · w + bias, for every row. */
export function multiplyRows(x: CsrMatrix, w: Float64Array, bias: number, out: Float64Array): void {
  const { indptr, indices, data, rows } = x;
  for (let i = 0; i < rows; i++) {
    let s = bias;
    const end = indptr[i + 1];
    for (let k = indptr[i]; k < end; k++) s += data[k] * w[indices[k]];
    out[i] = s;
  }
}

/** out += Xᵀ u (scatter by rows, so no transposed copy is needed). */
export function addTransposedProduct(x: CsrMatrix, u: Float64Array, out: Float64Array): void {
  const { indptr, indices, data, rows } = x;
  for (let i = 0; i < rows; i++) {
    const ui = u[i];
    if (ui === 0) continue;
    const end = indptr[i + 1];
    for (let k = indptr[i]; k < end; k++) out[indices[k]] += ui * data[k];
  }
}

/** Throws when a value is not finite, so NaN never reaches a solver. */
export function assertFiniteCsr(x: CsrMatrix): void {
  for (let k = 0; k < x.data.length; k++) {
    if (!Number.isFinite(x.data[k])) {
      throw new Error(`The feature matrix holds a non-finite value (${x.data[k]}); clean the input first.`);
    }
  }
}

/** The transpose as CSR (so columns become rows, in row order); `square` squares the values. */
export function transposeCsr(x: CsrMatrix, square = false): CsrMatrix {
  const { indptr, indices, data, rows, cols } = x;
  const outPtr = new Int32Array(cols + 1);
  for (let p = 0; p < indices.length; p++) outPtr[indices[p] + 1]++;
  for (let j = 0; j < cols; j++) outPtr[j + 1] += outPtr[j];
  const next = outPtr.slice(0, cols);
  const outIdx = new Int32Array(indices.length);
  const outData = new Float64Array(indices.length);
  for (let i = 0; i < rows; i++) {
    for (let p = indptr[i]; p < indptr[i + 1]; p++) {
      const q = next[indices[p]]++;
      outIdx[q] = i;
      outData[q] = square ? data[p] * data[p] : data[p];
    }
  }
  return { rows: cols, cols: rows, indptr: outPtr, indices: outIdx, data: outData };
}
