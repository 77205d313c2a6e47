import { useParams } from 'react-router';
import {
  SupplierPortalFrame,
  SupplierPortalPage,
} from '@/features/supplier-portal/components/supplier-portal-page';

/** /supplier/:token, public: the supplier answers a corrective-action request or reads a return notice. */
export function SupplierPortalRoute() {
  const token = useParams().token ?? '';
  return (
    <SupplierPortalFrame>
      <SupplierPortalPage token={token} />
    </SupplierPortalFrame>
  );
}
