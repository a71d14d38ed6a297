/** The boom-aiming rule lives with the scene model (the placement advisor uses it too). */
export { aimBoom, slewToward } from '@/lib/scene/aim';
