/**
 * libuv's thread pool (4 threads unless told) runs every sharp operation, file read and write,
 * and hash of the API. With two derivative tasks, the perceptual hash and the upload checks of
 * four incoming photos, four threads queue file I/O behind image work (DEVELOPERS.md, Benchmarks:
 * a small gain, inside the noise of a shared machine). libuv reads the size once, on first use,
 * so this module is imported first.
 */
process.env.UV_THREADPOOL_SIZE ??= '8';
