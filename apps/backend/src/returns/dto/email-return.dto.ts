import { SupplierMailDto } from '../../common/supplier-mail.dto';

/** E-mails the return notice to the supplier. */
export class EmailReturnDto extends SupplierMailDto {}
