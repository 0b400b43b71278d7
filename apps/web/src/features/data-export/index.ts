export { CustomerData } from './components/customer-data';
export { EraseCustomer } from './components/erase-customer';
export { ShopExportCard } from './components/shop-export-card';
