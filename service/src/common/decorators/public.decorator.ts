import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';
/** Marks a route open to visitors without a session. Every other route needs one. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
