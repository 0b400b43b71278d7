import { ComingLater } from '../../../components/coming-later';

export function CustomersRoute() {
  return <ComingLater title="Customers & bikes" arrivesWith="the workshop records issue: owners, their bikes and each bike's history" />;
}
