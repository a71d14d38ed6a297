import { idParams, route } from '@/lib/api/route';
import { retire } from '../../retire-profile';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

export const POST = route({ roles: rolesFor('manageEquipment'), params: idParams }, async ({ user, params }) => retire(user, params.id));
