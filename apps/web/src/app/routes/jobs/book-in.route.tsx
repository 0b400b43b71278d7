import { notifications } from '@mantine/notifications';
import { useNavigate } from 'react-router';
import { PageHeader } from '../../../components/page-header';
import { BIKE_FORM_MODEL, BikeChooser, BikeSpecFields } from '../../../features/bikes';
import { CUSTOMER_FORM_MODEL, CustomerFields, CustomerSearch } from '../../../features/customers';
import { BookInForm, type BookInSlots } from '../../../features/jobs';
import { useStaff } from '../staff';

/** Customers and bikes meet the booking-in form here, so no feature imports another. */
const slots: BookInSlots = {
  customerSearch: (p) => <CustomerSearch {...p} />,
  customerFields: (field) => <CustomerFields field={field} />,
  bikeChooser: (p) => <BikeChooser {...p} />,
  bikeFields: (field) => <BikeSpecFields field={field} />,
  bikeModel: BIKE_FORM_MODEL,
  customerModel: CUSTOMER_FORM_MODEL,
};

export function BookInRoute() {
  const navigate = useNavigate();
  const { mechanics } = useStaff();
  return (
    <>
      <PageHeader title="Book a bike in" subtitle="Owner, bike, what they tell you, and when it is promised. One save at the end." />
      <BookInForm
        slots={slots}
        mechanics={mechanics}
        onBooked={(job) => {
          notifications.show({
            color: 'teal',
            title: `Booked in as ${job.number}`,
            message: `${job.bike.maker} ${job.bike.model} for ${job.customer.name}.`,
            autoClose: 8000,
          });
          void navigate(`/jobs/${job.id}`);
        }}
      />
    </>
  );
}
