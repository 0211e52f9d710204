/** SI scale factors used at the nm ↔ m edge of the optics kernels (by definition of the prefix). */
export const M_PER_NM = 1e-9;
export const RAD_PER_DEG = Math.PI / 180;
